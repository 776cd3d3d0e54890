import type { PanelDocJSON, ReleaseManifest, ReleasePanel, ReleaseStory } from '@mantlepiece/shared/kiosk';
import type { ResolveMedia } from '@mantlepiece/shared/kiosk';
import { lookupLanguage, lookupText, mediaIdsIn } from '@mantlepiece/shared/kiosk';
import type { PlayableRelease } from '../sync/playable-release';

/**
 * The languages a story's text is looked for in, best first: the visitor's, the venue's, then the
 * story's own (which may be en-GB in an en venue). RFC 4647 lookup truncates each in turn.
 */
const wantedFor = (locale: string, story: ReleaseStory, manifest: ReleaseManifest) => [locale, manifest.venue.sourceLocale, story.sourceLocale];

/** A panel's document in the visitor's language by lookup, or in the story's language when it has none. */
export function panelDoc(story: ReleaseStory, panel: ReleasePanel, locale: string, manifest: ReleaseManifest): { doc: PanelDocJSON; locale: string } | null {
  const found = lookupLanguage(wantedFor(locale, story, manifest), Object.keys(panel.docs));
  return found === undefined ? null : { doc: panel.docs[found]!, locale: found };
}

export function storyTitle(story: ReleaseStory, locale: string, manifest: ReleaseManifest): { text: string; locale: string } {
  const found = lookupText(story.title, wantedFor(locale, story, manifest));
  return found ? { text: found.text, locale: found.tag } : { text: Object.values(story.title)[0] ?? '', locale: manifest.venue.sourceLocale };
}

export const panelsInOrder = (story: ReleaseStory): ReleasePanel[] => [...story.panels].sort((a, b) => a.position - b.position);

/** The first image a story shows, for its highlight on the attract loop and its card in the menu. */
export function storyImage(story: ReleaseStory, manifest: ReleaseManifest): string | undefined {
  for (const panel of panelsInOrder(story)) {
    const shown = panelDoc(story, panel, manifest.venue.sourceLocale, manifest);
    const [first] = shown ? mediaIdsIn(shown.doc) : [];
    if (first) return first;
  }
  return undefined;
}

/** Images from the kiosk's own storage, with alt text in the shown language and the credit line. */
export function mediaResolver(release: PlayableRelease, locale: string): ResolveMedia {
  const byId = new Map(release.manifest.media.map((media) => [media.mediaId, media]));
  return (mediaId) => {
    const media = byId.get(mediaId);
    const src = release.imageUrls.get(mediaId);
    if (!media || !src) return null;
    return { src, alt: lookupText(media.alt, [locale, release.manifest.venue.sourceLocale])?.text ?? '', credit: media.credit ?? undefined };
  };
}
