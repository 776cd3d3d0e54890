import { imageFindings, languageName } from './panel-findings.js';
import type { PreflightMedia, PreflightRule } from './types.js';

/** Alt text for a locale, matching the tag without regard to case (BCP 47 tags are case-insensitive). */
export function altTextFor(asset: PreflightMedia, locale: string): string {
  const key = Object.keys(asset.alt).find((tag) => tag.toLowerCase() === locale.toLowerCase());
  return key === undefined ? '' : (asset.alt[key] ?? '').trim();
}

/** A visitor who cannot see the image gets its alt text read out; the source locale is the one every translation starts from. */
export const imageAltText: PreflightRule = {
  id: 'image-alt-text',
  severity: 'blocker',
  run: (context) => {
    const { sourceLocale } = context.snapshot.story;
    const language = languageName(sourceLocale);
    return imageFindings(
      context,
      (asset, image) => (altTextFor(asset, sourceLocale) ? null : `${image.name} has no alt text in ${language}. Describe what it shows in the media library.`),
      (name) => `${name}: every image has alt text in ${language}.`,
    );
  },
};
