import type { MediaLicence, MediaUsageView, MediaView } from '@mantlepiece/shared';
import type { Person } from '../auth/policy.js';
import { mediaCan } from './media-policy.js';
import type { MediaAsset } from './models/media-asset.model.js';
import { renditionStatusOf } from './renditions.presenter.js';

/** The public URL of a rendition: immutable, so kiosks, browsers and a CDN may keep it for a year. */
export const renditionUrl = (sha256: string, width: number) => `/media/${sha256}/${width}.webp`;

export function licenceOf(asset: MediaAsset): MediaLicence | null {
  if (asset.licenceKind === 'spdx' && asset.licenceSpdxId) return { kind: 'spdx', id: asset.licenceSpdxId };
  if (asset.licenceKind === 'all-rights-reserved' && asset.licenceHolder) return { kind: 'all-rights-reserved', holder: asset.licenceHolder };
  return null;
}

/** `asset` with its renditions and alt texts loaded; usage comes from panel_media_usages, `altLocales` from its venue and stories. */
export const toMediaView = (asset: MediaAsset, usedIn: MediaUsageView[], altLocales: string[], person: Person): MediaView => ({
  id: asset.id,
  sha256: asset.sha256,
  filename: asset.originalFilename,
  width: asset.width,
  height: asset.height,
  mime: asset.mime,
  bytes: asset.bytes,
  renditions: [...(asset.renditions ?? [])]
    .sort((a, b) => a.width - b.width)
    .map((rendition) => ({ width: rendition.width, url: renditionUrl(asset.sha256, rendition.width) })),
  renditionStatus: renditionStatusOf(asset),
  placeholder: asset.placeholder,
  credit: asset.credit ?? null,
  licence: licenceOf(asset),
  licenceExpiresOn: asset.licenceExpiresOn ?? null,
  alt: Object.fromEntries((asset.altTexts ?? []).map((alt) => [alt.locale, alt.text])),
  altLocales,
  createdAt: asset.createdAt.toISOString(),
  usedIn,
  can: mediaCan(person, { usedIn }),
});
