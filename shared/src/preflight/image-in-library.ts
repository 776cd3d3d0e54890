import { panelFindings, panelImages } from './panel-findings.js';
import type { PreflightRule } from './types.js';

/** A panel that points at a deleted asset would show a hole on the gallery screen. */
export const imageInLibrary: PreflightRule = {
  id: 'image-in-library',
  severity: 'blocker',
  run: (context) =>
    panelFindings(
      context,
      (panel, name) => {
        const images = panelImages(context, panel);
        if (images.length === 0) return null;
        const problems = images
          .filter((image) => !image.asset)
          .map((image) => `${name}: ${image.name} is no longer in the media library. Pick another image, or take it off the panel.`);
        return { problems, passed: `${name}: every image is in the media library.` };
      },
      'No panel shows an image.',
    ),
};
