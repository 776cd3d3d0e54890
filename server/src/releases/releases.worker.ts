import { Injectable, Logger, OnApplicationBootstrap, OnApplicationShutdown } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';
import { Release } from './models/release.model.js';
import { BUILD_LEASE_MS, BuildLeaseLost, ReleaseBuilder } from './release-builder.js';
import { ReleaseFileStore } from './release-file-store.js';

export interface BuildReport {
  ready: number[];
  failed: number[];
}

/**
 * Runs release builds beside the API. A queued build (Building, no lease) is claimed with a
 * conditional update, so several instances never build the same release; a claimed build whose
 * lease ran out belonged to a worker that died, and is failed with its files cleaned up, which is
 * what the server does first when it starts.
 */
@Injectable()
export class ReleasesWorker implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('ReleasesWorker');
  private timer?: NodeJS.Timeout;
  private running?: Promise<unknown>;

  constructor(
    @InjectModel(Release) private readonly releases: typeof Release,
    private readonly builder: ReleaseBuilder,
    private readonly files: ReleaseFileStore,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    await this.failAbandoned();
    if (this.config.releasePollIntervalMs === 0) return;
    this.timer = setInterval(() => this.kick(), this.config.releasePollIntervalMs);
    this.timer.unref();
  }

  onApplicationShutdown(): void {
    clearInterval(this.timer);
  }

  /** Starts work now rather than at the next poll; a no-op when the timer is off (the suites build by hand). */
  kick(): void {
    if (this.config.releasePollIntervalMs === 0 || this.running) return;
    this.running = this.poll().finally(() => (this.running = undefined));
  }

  /** Resolves once the poll in progress, if any, has finished, so a caller that builds by hand does not race it. */
  async idle(): Promise<void> {
    await this.running;
  }

  /** Builds every queued release, one after another. */
  async buildQueued(): Promise<BuildReport> {
    const report: BuildReport = { ready: [], failed: [] };
    const queued = await this.releases.findAll({ where: { state: 'building', leaseUntil: null }, order: [['id', 'ASC']] });
    for (const release of queued) {
      const [claimed] = await this.releases.update(
        { leaseUntil: this.clock.fromNow(BUILD_LEASE_MS), phase: 'Starting' },
        { where: { id: release.id, state: 'building', leaseUntil: null } },
      );
      if (claimed !== 1) continue;
      try {
        await this.builder.build(release);
        report.ready.push(release.id);
      } catch (error) {
        if (error instanceof BuildLeaseLost) continue;
        await this.fail(release.id, error instanceof Error ? error.message : String(error));
        report.failed.push(release.id);
      }
    }
    return report;
  }

  /** Fails claimed builds whose worker stopped pushing the lease on. */
  async failAbandoned(): Promise<number[]> {
    const abandoned = await this.releases.findAll({ where: { state: 'building', leaseUntil: { [Op.lt]: this.clock.now() } }, attributes: ['id'] });
    for (const { id } of abandoned) await this.fail(id, 'The build stopped before it finished (the server was stopped or crashed).');
    return abandoned.map((release) => release.id);
  }

  /** Failed, and the files only this build stored are deleted, so nothing of it remains to be served. */
  private async fail(releaseId: number, reason: string): Promise<void> {
    const [changed] = await this.releases.update(
      { state: 'failed', phase: 'Failed', failure: reason.slice(0, 1000), leaseUntil: null },
      { where: { id: releaseId, state: 'building' } },
    );
    if (changed !== 1) return;
    const removed = await this.files.discard(releaseId);
    this.logger.warn(`release ${releaseId} failed: ${reason} (${removed.length} unshared file(s) removed)`);
  }

  private async poll(): Promise<void> {
    try {
      await this.failAbandoned();
      await this.buildQueued();
    } catch (error) {
      this.logger.error(`release poll failed: ${error instanceof Error ? error.message : String(error)}`);
    }
  }
}
