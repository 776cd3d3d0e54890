import { imageFindings } from './panel-findings.js';
import type { PreflightRule } from './types.js';

/** An image whose licence is not recorded may be fine to show, but nobody can tell; a warning asks someone to find out. */
export const imageLicenceRecorded: PreflightRule = {
  id: 'image-licence-recorded',
  severity: 'warning',
  run: (context) =>
    imageFindings(
      context,
      (asset, image) =>
        asset.licence ? null : `${image.name} has no licence recorded. Record its SPDX licence, or "all rights reserved" with the holder, in the media library.`,
      (name) => `${name}: every image has its licence recorded.`,
    ),
};
