import { checkPublication, laterPublication, missingFiles, parseManifest, sha256Hex, verifyManifest, type KioskCredential } from '@mantlepiece/shared/kiosk';
import type { KioskApi } from '../app/kiosk-api';
import type { ReleaseRefusal } from '../storage/kiosk-db';
import type { KioskStore } from '../storage/kiosk-store';
import { downloadFile } from './file-download';

/**
 * How long a refused manifest is left alone before its files are downloaded again: a quarter of an
 * hour after the first refusal, doubling to a day. A bad file rarely mends itself, but a proxy's
 * cut copy can, and a kiosk that never tried again would wait for the next publish.
 */
export const REFUSAL_RETRY = { firstMs: 15 * 60_000, factor: 2, maxMs: 24 * 60 * 60_000 } as const;

const retryDelayMs = (attempts: number) => Math.min(REFUSAL_RETRY.firstMs * REFUSAL_RETRY.factor ** (attempts - 1), REFUSAL_RETRY.maxMs);

export type SyncOutcome =
  | { kind: 'unchanged' }
  | { kind: 'no-release' }
  /** Already stored: playing, kept or waiting for the attract loop. */
  | { kind: 'known'; releaseId: number }
  /** Every file checked and the signature verified: waiting for the attract loop. */
  | { kind: 'ready'; releaseId: number }
  | { kind: 'rejected'; reason: string }
  /** The manifest refused for a bad file has not changed: nothing downloaded until `retryAt`. */
  | { kind: 'backing-off'; releaseId: number; retryAt: string };

async function reject(store: KioskStore, reason: string): Promise<SyncOutcome> {
  // The current release keeps playing; the reason goes out with the next heartbeat.
  await store.setMeta('lastError', reason);
  return { kind: 'rejected', reason };
}

/**
 * One round of release sync: ask for the gallery's live manifest, and when it is new, verify it
 * and its publication record, download what is missing and mark it pending. Network failures
 * throw (the caller tries later); a release that fails its checks is rejected and never becomes
 * pending. A publication older than the one the kiosk follows is refused however well it is
 * signed, so a rollback reaches the kiosk only as a technician's new publication.
 */
export async function syncRelease(api: KioskApi, store: KioskStore, credential: KioskCredential, now: () => Date = () => new Date()): Promise<SyncOutcome> {
  const refusal = await store.meta('refusal');
  const backingOff = refusal !== null && now().getTime() < Date.parse(refusal.retryAt);
  const backOff = (): SyncOutcome => ({ kind: 'backing-off', releaseId: refusal!.releaseId, retryAt: refusal!.retryAt });
  const answer = await api.manifest(backingOff ? refusal.etag : await store.meta('manifestEtag'));
  if (answer.status === 'unchanged') return backingOff ? backOff() : { kind: 'unchanged' };
  if (answer.status === 'none') return { kind: 'no-release' };

  const { manifest: manifestJson, signature, publication } = answer.body;
  if (!(await verifyManifest(manifestJson, signature, credential.publicKey))) {
    return reject(store, 'The release manifest is not signed by this venue’s key.');
  }
  const followed = await store.meta('publication');
  const checked = await checkPublication(publication, manifestJson, credential.publicKey, { galleryId: credential.galleryId, highestSequence: followed?.sequence ?? null, now: now() });
  if (!checked.ok) return reject(store, checked.reason);
  const parsed = parseManifest(manifestJson);
  if (!parsed.ok) return reject(store, parsed.message);
  const { manifest } = parsed;
  if (manifest.galleryId !== credential.galleryId) {
    return reject(store, `Release ${manifest.releaseId} is for gallery ${manifest.galleryId}, not this kiosk’s gallery ${credential.galleryId}.`);
  }

  const manifestSha256 = await sha256Hex(manifestJson);
  const sameRefused = refusal?.manifestSha256 === manifestSha256;
  if (sameRefused && backingOff) {
    // Re-signed, not changed: the new ETag is kept so the next polls cost a 304 again.
    await store.setMeta('refusal', { ...refusal, etag: answer.etag });
    return backOff();
  }

  const alreadyStored = await store.release(manifest.releaseId);
  if (!alreadyStored) {
    for (const file of missingFiles(manifest, await store.fileHashes())) {
      const result = await downloadFile(api, store, file);
      if (result.ok) continue;
      const attempts = sameRefused ? refusal.attempts + 1 : 1;
      const retryAt = new Date(now().getTime() + retryDelayMs(attempts)).toISOString();
      const reason = `Release ${manifest.releaseId} refused: ${result.reason} Not downloaded again before ${retryAt} unless the release changes.`;
      await store.setMeta('refusal', { releaseId: manifest.releaseId, manifestSha256, etag: answer.etag, reason, attempts, retryAt } satisfies ReleaseRefusal);
      return reject(store, reason);
    }
    await store.putRelease({ releaseId: manifest.releaseId, manifestJson, signature, storedAt: new Date().toISOString() });
  }
  await store.setMeta('refusal', null);
  // Only a release that checked completely gets the ETag and moves the sequence on, so a refused one is asked for again.
  await store.setMeta('publication', laterPublication(followed, checked.record));
  await store.setMeta('manifestEtag', answer.etag);

  if ((await store.meta('current')) === manifest.releaseId) {
    // A rollback to the release playing now: nothing waits any more.
    await store.setMeta('pending', null);
    return { kind: 'known', releaseId: manifest.releaseId };
  }
  await store.setMeta('pending', manifest.releaseId);
  await store.setMeta('lastError', null);
  return alreadyStored ? { kind: 'known', releaseId: manifest.releaseId } : { kind: 'ready', releaseId: manifest.releaseId };
}

/**
 * Makes the pending release the current one and keeps the one it replaces (a rollback without a
 * download). Called only on the attract loop, when no visitor is mid-story.
 */
export async function promotePendingRelease(store: KioskStore): Promise<number | null> {
  const pending = await store.meta('pending');
  const current = await store.meta('current');
  if (pending === null || pending === current) return null;
  await store.setMeta('previous', current);
  await store.setMeta('current', pending);
  await store.setMeta('pending', null);
  await store.keepOnly([pending, current].filter((id): id is number => id !== null));
  return pending;
}
