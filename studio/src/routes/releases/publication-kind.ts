import type { ReleaseView } from '@mantlepiece/shared';

/**
 * What making a release Live does to its gallery, so the button and the dialog name it: a Ready
 * release is published; a Superseded one older than the Live release rolls the gallery back, and a
 * Superseded one newer than it (after an earlier rollback) moves the gallery forward again.
 */
export type PublicationKind = 'publish' | 'rollBack' | 'goForward';

export function publicationKind(release: ReleaseView, live: ReleaseView | undefined): PublicationKind | null {
  if (release.state === 'ready') return 'publish';
  if (release.state !== 'superseded') return null;
  return live && release.number > live.number ? 'goForward' : 'rollBack';
}
