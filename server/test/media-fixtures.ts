import { getModelToken } from '@nestjs/sequelize';
import type { RenditionState } from '@mantlepiece/shared';
import { MediaAsset } from '../src/media/models/media-asset.model.js';
import { RenditionsWorker } from '../src/media/renditions.worker.js';
import type { TestApp } from './test-app.js';

/**
 * Runs the renditions worker as its timer would (off in the suites) until the image is no longer
 * pending; images other suites left pending are worked off first. Returns the state it ended in.
 */
export async function prepareRenditions(t: TestApp, mediaId: number): Promise<RenditionState> {
  const assets = t.app.get<typeof MediaAsset>(getModelToken(MediaAsset));
  for (;;) {
    const asset = await assets.findByPk(mediaId, { attributes: ['id', 'renditionState'] });
    if (!asset) throw new Error(`image ${mediaId} is not in the library`);
    if (asset.renditionState !== 'pending') return asset.renditionState;
    if ((await t.app.get(RenditionsWorker).makePending()).length === 0) throw new Error(`image ${mediaId} is pending, but held by another instance`);
  }
}
