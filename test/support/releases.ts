import type { ReleaseView } from '@mantlepiece/shared';
import { vi } from 'vitest';
import type { apiAs } from './browser';

type Api = Awaited<ReturnType<typeof apiAs>>;

/** What a build asks for, as the Build dialog sends it: by default the latest approved revision of every story. */
type ReleaseChoices = Partial<Record<'revisionIds' | 'leaveOut' | 'showInSource', number[]>>;

/**
 * Builds a release of the gallery as a technician and publishes it once the build job has made it
 * Ready, asking for its state as the studio's Releases page does (vi.waitUntil: set-up, where
 * expect.poll does not belong). Answers the release as it was when Ready.
 */
export async function publishedRelease(technician: Api, galleryId: number, timeoutMs = 90_000, choices: ReleaseChoices = {}): Promise<ReleaseView> {
  const requested = await technician<ReleaseView>('POST', `/galleries/${galleryId}/releases`, choices);
  const release = await vi.waitUntil(async () => {
    const current = await technician<ReleaseView>('GET', `/releases/${requested.id}`);
    if (current.state === 'failed') throw new Error(`Release ${requested.id} of gallery ${galleryId} failed to build`);
    return current.state === 'ready' && current;
  }, { timeout: timeoutMs, interval: 250 });
  await technician('POST', `/releases/${release.id}/publish`);
  return release;
}
