import type { ReleaseView } from '@mantlepiece/shared';
import type { apiAs } from './browser';

type Api = Awaited<ReturnType<typeof apiAs>>;

/**
 * Builds a release of the gallery as a technician and publishes it once the build job has made it
 * Ready, polling its state as the studio's Releases page does. For set-up, where expect.poll does
 * not belong; answers the release as it was when Ready.
 */
export async function publishedRelease(technician: Api, galleryId: number, timeoutMs = 90_000): Promise<ReleaseView> {
  const requested = await technician<ReleaseView>('POST', `/galleries/${galleryId}/releases`, {});
  const deadline = Date.now() + timeoutMs;
  let release = requested;
  while (release.state !== 'ready') {
    if (release.state === 'failed' || Date.now() > deadline) throw new Error(`Release ${release.id} of gallery ${galleryId} is ${release.state}, not ready`);
    await new Promise((resolve) => setTimeout(resolve, 250));
    release = await technician<ReleaseView>('GET', `/releases/${requested.id}`);
  }
  await technician('POST', `/releases/${release.id}/publish`);
  return release;
}
