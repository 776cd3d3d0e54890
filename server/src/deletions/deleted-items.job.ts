import { Injectable, type OnModuleInit } from '@nestjs/common';
import { DELETION_GRACE_MS } from '@mantlepiece/shared';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';
import { BackgroundJobs } from '../jobs/background-jobs.service.js';
import { MediaService } from '../media/media.service.js';
import { PanelsService } from '../panels/panels.service.js';

/**
 * Purges the panels and images deleted longer ago than the deletion grace, so Undo has its window
 * and nothing lingers after it. Panels go first: an image a deleted panel still names is kept for
 * a later pass. A singleton (one instance at a time, under its lease); each purge also re-checks
 * the row's moment inside its own delete, so a pass overlapping a lease handover removes nothing twice.
 */
@Injectable()
export class DeletedItemsJob implements OnModuleInit {
  constructor(
    private readonly panels: PanelsService,
    private readonly media: MediaService,
    private readonly clock: Clock,
    private readonly config: ConfigService,
    private readonly jobs: BackgroundJobs,
  ) {}

  onModuleInit(): void {
    this.jobs.register({ name: 'deleted-items', intervalMs: this.config.deletedItemsIntervalMs, singleton: true, run: () => this.purgeExpired() });
  }

  /** One pass; returns how many panels and images it removed. */
  async purgeExpired(): Promise<number> {
    const cutoff = this.clock.fromNow(-DELETION_GRACE_MS);
    return (await this.panels.purgeDeleted(cutoff)) + (await this.media.purgeDeleted(cutoff));
  }
}
