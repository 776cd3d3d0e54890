import { imageFindings } from './panel-findings.js';
import type { PreflightRule } from './types.js';

/** Every image shown in a gallery carries its credit line. */
export const imageCredit: PreflightRule = {
  id: 'image-credit',
  severity: 'blocker',
  run: (context) =>
    imageFindings(
      context,
      (asset, image) => (asset.credit?.trim() ? null : `${image.name} has no credit line. Add who made or owns it in the media library.`),
      (name) => `${name}: every image has a credit line.`,
    ),
};
