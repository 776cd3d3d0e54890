import { Inject, Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import { ConfigService } from '../config/config.service.js';
import { BackgroundJobs } from '../jobs/background-jobs.service.js';
import type { ClaimQueue } from '../jobs/claim-queue.js';
import { JobClaims } from '../jobs/job-claims.service.js';
import { ImageProcessing } from './image-processing.js';
import { MEDIA_STORE, originalKey, renditionKey, type MediaStore } from './media-store.js';
import { MediaAsset } from './models/media-asset.model.js';
import { MediaRendition } from './models/media-rendition.model.js';

export const RENDITIONS_JOB = 'media-renditions';
/** How long an instance holds an image between two renditions before another may take it over. */
export const RENDITION_CLAIM_MS = 120_000;
const BATCH = 2;

/** The claim ran out and another instance took the image, or the image was deleted: stop, record nothing. */
class ClaimLost extends Error {}

/**
 * Makes the WebP renditions of uploaded images beside the API. An image waiting for them
 * (pending) is claimed by one instance (see ClaimQueue); each rendition stored pushes the claim on
 * and records progress for the library, and a claim left by an instance that died is taken over
 * once it runs out. A failure is kept with its reason until someone retries.
 */
@Injectable()
export class RenditionsWorker implements OnModuleInit {
  private readonly logger = new Logger('RenditionsWorker');
  private readonly queue: ClaimQueue<MediaAsset>;

  constructor(
    @InjectModel(MediaAsset) private readonly assets: typeof MediaAsset,
    @InjectModel(MediaRendition) private readonly renditions: typeof MediaRendition,
    @Inject(MEDIA_STORE) private readonly store: MediaStore,
    private readonly images: ImageProcessing,
    private readonly jobs: BackgroundJobs,
    private readonly config: ConfigService,
    private readonly sequelize: Sequelize,
    claims: JobClaims,
  ) {
    this.queue = claims.queue(assets, RENDITION_CLAIM_MS);
  }

  onModuleInit(): void {
    this.jobs.register({ name: RENDITIONS_JOB, intervalMs: this.config.renditionPollIntervalMs, run: async () => (await this.makePending()).length });
  }

  /** Starts on new work now rather than at the next poll; a no-op when the timer is off (the suites run it by hand). */
  kick(): void {
    this.jobs.kick(RENDITIONS_JOB);
  }

  /** Makes the renditions of a few pending images; returns the ids it claimed, each now ready or failed (or lost to another instance). */
  async makePending(): Promise<number[]> {
    const claimed = await this.queue.claim({ renditionState: 'pending' }, { order: [['id', 'ASC']], limit: BATCH });
    for (const asset of claimed) await this.make(asset);
    return claimed.map((asset) => asset.id);
  }

  /**
   * Every pending image made, for the CLI's seed, which asks for a release right after uploading.
   * A pass of the timer's that holds some of them is waited for.
   */
  async makeAllPending(): Promise<void> {
    for (;;) {
      await this.jobs.idle(RENDITIONS_JOB);
      if ((await this.makePending()).length === 0 && (await this.assets.count({ where: { renditionState: 'pending' } })) === 0) return;
    }
  }

  private async make(asset: MediaAsset): Promise<void> {
    const made: { mediaAssetId: number; width: number; height: number; sha256: string; storeKey: string; bytes: number }[] = [];
    try {
      const original = await this.store.get(originalKey(asset.sha256));
      if (!original) throw new Error('The original is missing from the media store.');
      await this.images.renditionsOf(original, async (rendition, index, total) => {
        const storeKey = renditionKey(asset.sha256, rendition.width);
        await this.store.put(storeKey, rendition.data);
        made.push({ mediaAssetId: asset.id, width: rendition.width, height: rendition.height, sha256: rendition.sha256, storeKey, bytes: rendition.data.length });
        if (!(await this.queue.extend(asset.id, { renditionProgress: (index + 1) / total }))) throw new ClaimLost();
      });
      await this.sequelize.transaction(async (transaction) => {
        if (!(await this.queue.settle(asset.id, { renditionState: 'ready', renditionProgress: 1, renditionFailure: null }, transaction))) throw new ClaimLost();
        await this.renditions.bulkCreate(made, { updateOnDuplicate: ['height', 'sha256', 'storeKey', 'bytes', 'updatedAt'], transaction });
      });
      // One line per image made, by the instance that made it: with several instances, the logs show none was made twice.
      this.logger.log(`image ${asset.id}: ${made.length} renditions made`);
    } catch (error) {
      if (error instanceof ClaimLost) return this.forgetIfDeleted(asset, made);
      const reason = `The WebP renditions could not be made: ${error instanceof Error ? error.message : String(error)}`;
      await this.queue.settle(asset.id, { renditionState: 'failed', renditionFailure: reason.slice(0, 1000) });
      this.logger.warn(`image ${asset.id}: ${reason}`);
    }
  }

  /** An image deleted while its renditions were made leaves no files behind; one taken over keeps them for the new owner. */
  private async forgetIfDeleted(asset: MediaAsset, made: { storeKey: string }[]): Promise<void> {
    if (await this.assets.count({ where: { id: asset.id } })) return;
    for (const { storeKey } of made) await this.store.remove(storeKey);
  }
}
