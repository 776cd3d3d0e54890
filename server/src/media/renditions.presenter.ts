import type { RenditionStatus } from '@mantlepiece/shared';
import type { MediaAsset } from './models/media-asset.model.js';

export const renditionStatusOf = (asset: MediaAsset): RenditionStatus => ({
  state: asset.renditionState,
  progress: asset.renditionProgress,
  failure: asset.renditionFailure ?? null,
});
