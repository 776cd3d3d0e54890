import { Injectable, Logger, type BeforeApplicationShutdown, type OnApplicationBootstrap } from '@nestjs/common';
import { JobLeases } from './job-leases.service.js';
import { JobLoop } from './job-loop.js';

export interface BackgroundJob {
  /** Names the job in logs and, for a singleton, its lease. */
  name: string;
  /** The wait after a pass that found no work; 0 leaves the timer off (the suites run passes by hand). */
  intervalMs: number;
  /** Runs on one instance at a time, under a lease named after the job, rather than claiming items. */
  singleton?: boolean;
  /** One pass; returns how many items it handled, so a pass that found work is followed at once by another. */
  run(): Promise<number>;
}

/** A singleton's lease outlasts a few of its intervals, so its holder keeps it from run to run. */
const singletonLeaseMs = (intervalMs: number) => Math.max(3 * intervalMs, 60_000);

/**
 * Every background worker of the server, each a `BackgroundJob` registered when its module starts:
 * their loops start once the app is up and stop, each pass allowed to finish, before the database
 * closes on shutdown. Workers claim their items through a `ClaimQueue` (`JobClaims`); singletons
 * are guarded here by a lease.
 */
@Injectable()
export class BackgroundJobs implements OnApplicationBootstrap, BeforeApplicationShutdown {
  private readonly logger = new Logger('BackgroundJobs');
  private readonly jobs = new Map<string, { job: BackgroundJob; loop: JobLoop }>();

  constructor(private readonly leases: JobLeases) {}

  register(job: BackgroundJob): void {
    if (this.jobs.has(job.name)) throw new Error(`A background job named ${job.name} is registered already.`);
    const loop = new JobLoop(() => this.pass(job), job.intervalMs, (error, retryInMs) => {
      this.logger.error(`${job.name} failed, next try in ${Math.round(retryInMs / 1000)} s: ${error instanceof Error ? error.message : String(error)}`);
    });
    this.jobs.set(job.name, { job, loop });
  }

  onApplicationBootstrap(): void {
    for (const { job, loop } of this.jobs.values()) if (job.intervalMs > 0) loop.start();
  }

  /** A pass soon, for work just queued; nothing when the job's timer is off. */
  kick(name: string): void {
    this.entry(name).loop.kick();
  }

  /** Resolves once the job's pass in progress, if any, has finished, so a caller running one by hand does not race it. */
  idle(name: string): Promise<void> {
    return this.entry(name).loop.idle();
  }

  /** One pass now, as the timer runs it (a singleton only while this instance holds its lease); returns the items handled. */
  runNow(name: string): Promise<number> {
    return this.pass(this.entry(name).job);
  }

  async beforeApplicationShutdown(): Promise<void> {
    await Promise.all([...this.jobs.values()].map(({ loop }) => loop.stop()));
    for (const { job } of this.jobs.values()) {
      if (job.singleton) await this.leases.release(job.name).catch(() => undefined);
    }
  }

  private async pass(job: BackgroundJob): Promise<number> {
    if (job.singleton && !(await this.leases.hold(job.name, singletonLeaseMs(job.intervalMs)))) return 0;
    return job.run();
  }

  private entry(name: string): { job: BackgroundJob; loop: JobLoop } {
    const entry = this.jobs.get(name);
    if (!entry) throw new Error(`No background job is named ${name}.`);
    return entry;
  }
}
