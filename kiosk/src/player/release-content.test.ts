import { describe, expect, it } from 'vitest';
import { RELEASE_FORMAT, type PanelDocJSON, type ReleaseManifest, type ReleaseStory } from '@mantlepiece/shared/kiosk';
import type { PlayableRelease } from '../sync/playable-release';
import { mediaResolver, panelDoc, storyImage, storyTitle } from './release-content';

const doc = (words: string): PanelDocJSON => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: words }] }, { type: 'panelImage', attrs: { mediaId: '4' } }] });

// A story written in en-GB at a venue whose stories are otherwise in en, translated into fr.
const story: ReleaseStory = {
  id: 9, revisionId: 21, sourceLocale: 'en-GB', audience: 'family',
  title: { 'en-GB': 'Why the sea floor deepens', fr: 'Pourquoi le fond marin s’approfondit' },
  panels: [{ id: 31, position: 1, docs: { 'en-GB': doc('Colour of the rock'), fr: doc('Couleur de la roche') } }],
};
const manifest: ReleaseManifest = {
  format: RELEASE_FORMAT, releaseId: 5, number: 5, galleryId: 2, createdAt: '2026-03-02T09:00:00.000Z', fallbackToSource: true,
  venue: { name: 'Basalt Point Earth Science Centre', sourceLocale: 'en', locales: ['en', 'fr', 'fr-CA'] },
  stories: [story],
  media: [{ mediaId: '4', alt: { en: 'Dark basalt on the ridge flank', fr: 'Basalte sombre sur le flanc de la dorsale' }, credit: null, renditions: [] }],
  files: [],
};
const release: PlayableRelease = { releaseId: 5, manifest, imageUrls: new Map([['4', 'blob:4']]), dispose: () => {} };
const [panel] = story.panels;

// RFC 4647 §3.4 lookup: each wanted language is truncated from the right until a tag matches.
describe('text chosen by language on the kiosk', () => {
  it('shows an en visitor the story’s en-GB text, which the venue’s en cannot find by lookup', () => {
    expect(panelDoc(story, panel!, 'en', manifest)?.locale).toBe('en-GB');
    expect(storyTitle(story, 'en', manifest)).toEqual({ text: 'Why the sea floor deepens', locale: 'en-GB' });
    expect(storyImage(story, manifest)).toBe('4');
  });

  it('falls back from fr-CA to fr for panels, titles and alt text', () => {
    expect(panelDoc(story, panel!, 'fr-CA', manifest)?.locale).toBe('fr');
    expect(storyTitle(story, 'fr-CA', manifest).locale).toBe('fr');
    expect(mediaResolver(release, 'fr-CA')('4')?.alt).toBe('Basalte sombre sur le flanc de la dorsale');
  });

  it('gives en-GB text the image’s en alt text', () => {
    expect(mediaResolver(release, 'en-GB')('4')?.alt).toBe('Dark basalt on the ridge flank');
  });
});
