import { plainUnit } from './segment-panel.js';
import { withSourceHash, type TranslationUnit } from './translation-unit.js';

/** A story title's unit id: the title belongs to the story, as a panel's texts belong to the panel. */
const storyTitleUnitId = (storyId: string | number) => `s${storyId}.title`;

/**
 * A story's title as a unit. The kiosk's story menu and attract loop show it, so a visitor who
 * chose French reads the title in French too, falling back by the venue's rule like panel text.
 */
export function segmentStoryTitle(storyId: string | number, title: string, options: { sourceLocale: string }): Promise<TranslationUnit> {
  const id = String(storyId);
  return withSourceHash(
    plainUnit({ id: storyTitleUnitId(id), kind: 'storyTitle', sourceLocale: options.sourceLocale, location: { type: 'storyTitle', storyId: id }, context: { storyId: id } }, title),
  );
}
