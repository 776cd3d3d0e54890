import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { backOffMs, JobLoop, LONGEST_BACK_OFF_MS } from './job-loop.js';

beforeEach(() => vi.useFakeTimers());
afterEach(() => vi.useRealTimers());

/** A loop over scripted passes: each entry is the number of items a pass handles, or an error it throws. */
function loopOver(script: (number | Error)[], intervalMs = 1000) {
  const passesAt: number[] = [];
  const failures: number[] = [];
  const loop = new JobLoop(async () => {
    passesAt.push(Date.now());
    const next = script.shift() ?? 0;
    if (next instanceof Error) throw next;
    return next;
  }, intervalMs, (_error, retryInMs) => failures.push(retryInMs));
  return { loop, passesAt, failures };
}

describe('job loop', () => {
  it('waits an interval after an empty pass and goes again at once after one that found work', async () => {
    const start = Date.now();
    const { loop, passesAt } = loopOver([0, 3, 2, 0]);
    loop.start();
    await vi.advanceTimersByTimeAsync(2500);
    const at = passesAt.map((moment) => moment - start);
    expect(at.slice(0, 2)).toEqual([1000, 2000]);
    // After each pass that found work the next follows at once (a zero-delay timer), not an interval later.
    expect([at[2]! - at[1]!, at[3]! - at[2]!].every((gap) => gap < 10)).toBe(true);
    expect(at).toHaveLength(4);
    await loop.stop();
  });

  it('backs off by doubling the wait while passes fail, up to its longest wait, and is back to the interval after a success', async () => {
    expect([1, 2, 3].map((failures) => backOffMs(1000, failures))).toEqual([2000, 4000, 8000]);
    expect(backOffMs(1000, 30)).toBe(LONGEST_BACK_OFF_MS);
    const down = new Error('database down');
    const { loop, failures, passesAt } = loopOver([down, down, down, 0, 0]);
    const start = Date.now();
    loop.start();
    await vi.advanceTimersByTimeAsync(1000 + 2000 + 4000 + 8000 + 1000 + 500);
    expect(failures).toEqual([2000, 4000, 8000]);
    expect(passesAt.map((at) => at - start)).toEqual([1000, 3000, 7000, 15000, 16000]);
    await loop.stop();
  });

  it('runs a kicked pass at once, and after the running one rather than beside it', async () => {
    let finish!: () => void;
    let running = 0;
    let most = 0;
    const loop = new JobLoop(async () => {
      running += 1;
      most = Math.max(most, running);
      await new Promise<void>((resolve) => (finish = resolve));
      running -= 1;
      return 0;
    }, 60_000, () => undefined);
    loop.start();
    loop.kick();
    await vi.advanceTimersByTimeAsync(0);
    expect(running).toBe(1);
    loop.kick();
    finish();
    await vi.advanceTimersByTimeAsync(0);
    expect(running).toBe(1);
    expect(most).toBe(1);
    finish();
    await loop.stop();
  });

  it('stops after the pass in progress has finished, and runs no more', async () => {
    let finish!: () => void;
    let passes = 0;
    const loop = new JobLoop(async () => {
      passes += 1;
      await new Promise<void>((resolve) => (finish = resolve));
      return 1;
    }, 1000, () => undefined);
    loop.start();
    await vi.advanceTimersByTimeAsync(1000);
    let stopped = false;
    const stopping = loop.stop().then(() => (stopped = true));
    await vi.advanceTimersByTimeAsync(0);
    expect(stopped).toBe(false);
    finish();
    await stopping;
    await vi.advanceTimersByTimeAsync(10_000);
    expect(passes).toBe(1);
  });
});
