import { Injectable, Logger, type OnApplicationBootstrap, type OnModuleInit } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type WhereOptions } from 'sequelize';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';
import { BackgroundJobs } from '../jobs/background-jobs.service.js';
import type { ClaimQueue } from '../jobs/claim-queue.js';
import { JobClaims } from '../jobs/job-claims.service.js';
import { Release } from './models/release.model.js';
import { BUILD_LEASE_MS, BuildLeaseLost, ReleaseBuilder } from './release-builder.js';
import { ReleaseFileStore } from './release-file-store.js';

export interface BuildReport {
  ready: number[];
  failed: number[];
}

const JOB = 'release-builds';

/**
 * Runs release builds beside the API. A queued build (Building, never claimed) is claimed by one
 * instance (see ClaimQueue), so several instances never build the same release. A claim that ran
 * out belonged to a worker that died: that build is failed with its files cleaned up rather than
 * taken over, which is also what the server does first when it starts.
 */
@Injectable()
export class ReleasesWorker implements OnModuleInit, OnApplicationBootstrap {
  private readonly logger = new Logger('ReleasesWorker');
  private readonly queue: ClaimQueue<Release>;

  constructor(
    @InjectModel(Release) private readonly releases: typeof Release,
    claims: JobClaims,
    private readonly jobs: BackgroundJobs,
    private readonly builder: ReleaseBuilder,
    private readonly files: ReleaseFileStore,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {
    this.queue = claims.queue(releases, BUILD_LEASE_MS);
  }

  onModuleInit(): void {
    this.jobs.register({
      name: JOB,
      intervalMs: this.config.releasePollIntervalMs,
      run: async () => {
        const abandoned = await this.failAbandoned();
        const { ready, failed } = await this.buildQueued();
        return abandoned.length + ready.length + failed.length;
      },
    });
  }

  async onApplicationBootstrap(): Promise<void> {
    await this.failAbandoned();
  }

  /** Starts work now rather than at the next poll; a no-op when the timer is off (the suites build by hand). */
  kick(): void {
    this.jobs.kick(JOB);
  }

  /** Resolves once the poll in progress, if any, has finished, so a caller that builds by hand does not race it. */
  idle(): Promise<void> {
    return this.jobs.idle(JOB);
  }

  /** Builds every queued release, one claim at a time: a claim is held only while its build runs. */
  async buildQueued(): Promise<BuildReport> {
    const report: BuildReport = { ready: [], failed: [] };
    for (;;) {
      const [release] = await this.queue.claim({ state: 'building', claimedBy: null }, { order: [['id', 'ASC']], limit: 1 });
      if (!release) return report;
      try {
        await this.builder.build(release, this.queue);
        // One line per build, by the instance that ran it: with several instances, the logs show none was built twice.
        this.logger.log(`release ${release.id} built`);
        report.ready.push(release.id);
      } catch (error) {
        if (error instanceof BuildLeaseLost) continue;
        await this.fail(release.id, error instanceof Error ? error.message : String(error), { claimedBy: this.queue.owner });
        report.failed.push(release.id);
      }
    }
  }

  /** Fails claimed builds whose worker stopped pushing the claim on. */
  async failAbandoned(): Promise<number[]> {
    const expired = { claimExpiresAt: { [Op.lt]: this.clock.now() } };
    const abandoned = await this.releases.findAll({ where: { state: 'building', ...expired }, attributes: ['id'] });
    const failed: number[] = [];
    for (const { id } of abandoned) {
      if (await this.fail(id, 'The build stopped before it finished (the server was stopped or crashed).', expired)) failed.push(id);
    }
    return failed;
  }

  /** Failed, and the files only this build stored are deleted, so nothing of it remains to be served. */
  private async fail(releaseId: number, reason: string, held: WhereOptions<Release>): Promise<boolean> {
    const [changed] = await this.releases.update(
      { state: 'failed', phase: 'Failed', failure: reason.slice(0, 1000), claimedBy: null, claimExpiresAt: null },
      { where: { [Op.and]: [{ id: releaseId, state: 'building' }, held] } },
    );
    if (changed !== 1) return false;
    const removed = await this.files.discard(releaseId);
    this.logger.warn(`release ${releaseId} failed: ${reason} (${removed.length} unshared file(s) removed)`);
    return true;
  }
}
