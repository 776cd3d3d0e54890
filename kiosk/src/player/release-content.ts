import type { PanelDocJSON, ReleaseManifest, ReleasePanel, ReleaseStory } from '@mantlepiece/shared/kiosk';
import type { ResolveMedia } from '@mantlepiece/shared/kiosk';
import { mediaIdsIn } from '@mantlepiece/shared/kiosk';
import type { PlayableRelease } from '../sync/playable-release';

/** A panel's document in the visitor's language, or in the source language when it has none. */
export function panelDoc(panel: ReleasePanel, locale: string, manifest: ReleaseManifest): { doc: PanelDocJSON; locale: string } | null {
  const own = panel.docs[locale];
  if (own) return { doc: own, locale };
  const source = panel.docs[manifest.venue.sourceLocale];
  return source ? { doc: source, locale: manifest.venue.sourceLocale } : null;
}

export function storyTitle(story: ReleaseStory, locale: string, manifest: ReleaseManifest): { text: string; locale: string } {
  const own = story.title[locale];
  if (own) return { text: own, locale };
  const sourceLocale = manifest.venue.sourceLocale;
  return { text: story.title[sourceLocale] ?? Object.values(story.title)[0] ?? '', locale: sourceLocale };
}

export const panelsInOrder = (story: ReleaseStory): ReleasePanel[] => [...story.panels].sort((a, b) => a.position - b.position);

/** The first image a story shows, for its highlight on the attract loop and its card in the menu. */
export function storyImage(story: ReleaseStory, manifest: ReleaseManifest): string | undefined {
  for (const panel of panelsInOrder(story)) {
    const doc = panel.docs[manifest.venue.sourceLocale];
    const [first] = doc ? mediaIdsIn(doc) : [];
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
    return { src, alt: media.alt[locale] ?? media.alt[release.manifest.venue.sourceLocale] ?? '', credit: media.credit ?? undefined };
  };
}
