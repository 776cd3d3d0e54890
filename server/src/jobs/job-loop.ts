/** The longest a failing job waits before it tries again. */
export const LONGEST_BACK_OFF_MS = 5 * 60_000;

/** After `failures` failed passes in a row: the interval doubled for each, at most LONGEST_BACK_OFF_MS. */
export const backOffMs = (intervalMs: number, failures: number): number => Math.min(intervalMs * 2 ** failures, LONGEST_BACK_OFF_MS);

/**
 * Runs one job's passes for ever: again at once while a pass finds work, after the interval when it
 * finds none, and after a doubling wait while passes fail (a database or mail server that is down
 * is not hammered). One pass at a time; stopping waits for the pass in progress.
 */
export class JobLoop {
  private timer?: NodeJS.Timeout;
  private running?: Promise<void>;
  private stopped = true;
  private kicked = false;
  private failures = 0;

  constructor(
    private readonly pass: () => Promise<number>,
    private readonly intervalMs: number,
    private readonly onFailure: (error: unknown, retryInMs: number) => void,
  ) {}

  start(): void {
    this.stopped = false;
    this.schedule(this.intervalMs);
  }

  /** A pass soon rather than at the next interval (new work was queued); after the current one if it is running. */
  kick(): void {
    if (this.stopped) return;
    if (this.running) this.kicked = true;
    else this.schedule(0);
  }

  /** Resolves once the pass in progress, if any, has finished. */
  async idle(): Promise<void> {
    await this.running;
  }

  async stop(): Promise<void> {
    this.stopped = true;
    clearTimeout(this.timer);
    await this.running;
  }

  private schedule(ms: number): void {
    clearTimeout(this.timer);
    this.timer = setTimeout(() => {
      this.running = this.tick().finally(() => (this.running = undefined));
    }, ms);
    // A pending pass never keeps the process alive by itself.
    this.timer.unref();
  }

  private async tick(): Promise<void> {
    let next: number;
    try {
      const handled = await this.pass();
      this.failures = 0;
      next = handled > 0 || this.kicked ? 0 : this.intervalMs;
    } catch (error) {
      this.failures += 1;
      next = backOffMs(this.intervalMs, this.failures);
      this.onFailure(error, next);
    }
    this.kicked = false;
    if (!this.stopped) this.schedule(next);
  }
}
