import { lookupText } from '../languages/language-tags.js';
import { imageFindings, languageName } from './panel-findings.js';
import type { PreflightMedia, PreflightRule } from './types.js';

/**
 * Alt text for a locale by RFC 4647 lookup among the languages it is written in, so a story in
 * en-GB is served by alt text in en; '' when none fits.
 */
export const altTextFor = (asset: PreflightMedia, locale: string): string => lookupText(asset.alt, [locale])?.text.trim() ?? '';

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
