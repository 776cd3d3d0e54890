import { parseManifest, verifyManifest, type ReleaseManifest, type ReleaseMedia } from '@mantlepiece/shared/kiosk';
import type { KioskStore } from '../storage/kiosk-store';
import { promotePendingRelease } from './release-sync';

/** The widest rendition a station needs: its long side (1920 CSS px) at device scale 1. */
const STATION_WIDTH_PX = 1920;

/** A release ready to play from storage alone: its manifest and an object URL per image. */
export interface PlayableRelease {
  releaseId: number;
  manifest: ReleaseManifest;
  /** Object URL of the rendition chosen for each media id. */
  imageUrls: ReadonlyMap<string, string>;
  dispose: () => void;
}

/** The smallest rendition at least as wide as the station, else the widest there is. */
export function chooseRendition(media: ReleaseMedia): ReleaseMedia['renditions'][number] | undefined {
  const byWidth = [...media.renditions].sort((a, b) => a.width - b.width);
  return byWidth.find((rendition) => rendition.width >= STATION_WIDTH_PX) ?? byWidth.at(-1);
}

/**
 * Opens a stored release, checking its signature again (storage is not a trust boundary a kiosk
 * controls for months) and that every file is there. Null when it cannot be played.
 */
export async function openStoredRelease(store: KioskStore, releaseId: number, publicKey: string): Promise<PlayableRelease | null> {
  const stored = await store.release(releaseId);
  if (!stored || !(await verifyManifest(stored.manifestJson, stored.signature, publicKey))) return null;
  const parsed = parseManifest(stored.manifestJson);
  if (!parsed.ok) return null;
  const { manifest } = parsed;
  const have = await store.fileHashes();
  if (!manifest.files.every((file) => have.has(file.sha256))) return null;

  const imageUrls = new Map<string, string>();
  for (const media of manifest.media) {
    const rendition = chooseRendition(media);
    const file = rendition && (await store.file(rendition.sha256));
    if (file) imageUrls.set(media.mediaId, URL.createObjectURL(new Blob([file.bytes], { type: file.mime })));
  }
  return {
    releaseId,
    manifest,
    imageUrls,
    dispose: () => imageUrls.forEach((url) => URL.revokeObjectURL(url)),
  };
}

/**
 * The release to play at boot, from storage only (the server may be away): one that became ready
 * while the kiosk was off is switched to now, since no visitor can be mid-story at boot; then the
 * current release; then the one kept before it.
 */
export async function bootRelease(store: KioskStore, publicKey: string): Promise<PlayableRelease | null> {
  await promotePendingRelease(store);
  for (const releaseId of [await store.meta('current'), await store.meta('previous')]) {
    if (releaseId === null) continue;
    const release = await openStoredRelease(store, releaseId, publicKey);
    if (release) return release;
  }
  return null;
}
