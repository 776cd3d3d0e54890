import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { RenditionStatus } from '@mantlepiece/shared';
import { renditionStatusOf } from './renditions.presenter.js';
import { MediaAsset } from './models/media-asset.model.js';
import { RenditionsWorker } from './renditions.worker.js';

/** What people do about an image's renditions: ask again for ones that failed. */
@Injectable()
export class RenditionsService {
  constructor(
    @InjectModel(MediaAsset) private readonly assets: typeof MediaAsset,
    private readonly worker: RenditionsWorker,
  ) {}

  /** Queues a failed image again; refused (409) while its renditions are waiting or made. */
  async retry(id: number): Promise<RenditionStatus> {
    const [queued] = await this.assets.update(
      { renditionState: 'pending', renditionProgress: 0, renditionFailure: null },
      { where: { id, renditionState: 'failed' } },
    );
    if (queued !== 1) {
      const asset = await this.assets.findByPk(id, { attributes: ['id', 'renditionState'] });
      if (!asset) throw new NotFoundException('There is no such image.');
      throw new ConflictException(asset.renditionState === 'ready'
        ? 'The renditions of this image are made already; there is nothing to retry.'
        : 'The renditions of this image are being prepared; retry only once they have failed.');
    }
    this.worker.kick();
    return renditionStatusOf((await this.assets.findByPk(id))!);
  }
}
