import { ConflictException, Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { RenditionStatus } from '@mantlepiece/shared';
import type { Member } from '../auth/policy.js';
import { actingAt, withinReach } from '../common/venue-boundary.js';
import { MEDIA_KEEPERS } from './media-policy.js';
import { NO_SUCH_IMAGE } from './media.service.js';
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

  /** Queues a failed image again, for a keeper of its venue's library; refused (409) while its renditions are waiting or made. */
  async retry(id: number, member: Member): Promise<RenditionStatus> {
    const found = withinReach(member, await this.assets.findByPk(id, { attributes: ['id', 'venueId'] }), NO_SUCH_IMAGE);
    actingAt(member, found.venueId, MEDIA_KEEPERS);
    const [queued] = await this.assets.update(
      { renditionState: 'pending', renditionProgress: 0, renditionFailure: null },
      { where: { id, renditionState: 'failed' } },
    );
    if (queued !== 1) {
      const asset = (await this.assets.findByPk(id, { attributes: ['id', 'renditionState'] }))!;
      throw new ConflictException(asset.renditionState === 'ready'
        ? 'The renditions of this image are made already; there is nothing to retry.'
        : 'The renditions of this image are being prepared; retry only once they have failed.');
    }
    this.worker.kick();
    return renditionStatusOf((await this.assets.findByPk(id))!);
  }
}
