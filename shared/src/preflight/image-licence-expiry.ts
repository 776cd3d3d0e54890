import { imageFindings } from './panel-findings.js';
import type { PreflightRule } from './types.js';

/**
 * A licence covers its expiry day itself; dates are YYYY-MM-DD, so they compare as text. With a
 * planned end the licence must last the exhibit's whole run, or the story would have to come off
 * the screens early.
 */
export const imageLicenceExpiry: PreflightRule = {
  id: 'image-licence-expiry',
  severity: 'blocker',
  run: (context) => {
    const { today, exhibitPlannedEnd } = context;
    return imageFindings(
      context,
      ({ licenceExpiresOn: expires }, image) => {
        if (expires === null) return null;
        if (expires < today) return `the licence for ${image.name} ran out on ${expires}. Renew it, or replace the image.`;
        if (exhibitPlannedEnd !== null && expires < exhibitPlannedEnd) {
          return `the licence for ${image.name} runs out on ${expires}, before the exhibit's planned end on ${exhibitPlannedEnd}. Extend it to cover the exhibit, or replace the image.`;
        }
        return null;
      },
      (name) =>
        exhibitPlannedEnd === null
          ? `${name}: every image's licence is in force today (the exhibit has no planned end date to check against).`
          : `${name}: every image's licence lasts to the exhibit's planned end on ${exhibitPlannedEnd}.`,
    );
  },
};
