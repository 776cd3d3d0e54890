import { parseManifest, type KioskCredential } from '@mantlepiece/shared/kiosk';
import type { KioskDb, KioskMeta, StoredChunk, StoredFile, StoredRelease } from './kiosk-db';

const EMPTY_META: KioskMeta = { current: null, previous: null, pending: null, manifestEtag: null, lastError: null, publication: null, refusal: null, unpairedAt: null };

/** Everything the kiosk keeps between restarts: its credential, releases and their files. */
export class KioskStore {
  constructor(readonly db: KioskDb) {}

  credential(): Promise<KioskCredential | undefined> {
    return this.db.get('credential', 'device');
  }

  async saveCredential(credential: KioskCredential): Promise<void> {
    const transaction = this.db.transaction(['credential', 'meta'], 'readwrite');
    await Promise.all([transaction.objectStore('credential').put(credential, 'device'), transaction.objectStore('meta').delete('unpairedAt'), transaction.done]);
  }

  /**
   * Forgets everything the pairing gave: the credential, every release and file, the sync state and
   * the events not yet sent (the server refuses them now). One transaction, so a restart never finds
   * half of it; only the moment of the unpairing is kept, for the pairing screen.
   */
  async forgetPairing(at: Date): Promise<void> {
    const stores = ['credential', 'files', 'chunks', 'releases', 'meta', 'outbox'] as const;
    const transaction = this.db.transaction(stores, 'readwrite');
    await Promise.all([
      ...stores.map((name) => transaction.objectStore(name).clear()),
      transaction.objectStore('meta').put(at.toISOString(), 'unpairedAt'),
      transaction.done,
    ]);
  }

  async meta<K extends keyof KioskMeta>(key: K): Promise<KioskMeta[K]> {
    return ((await this.db.get('meta', key)) as KioskMeta[K] | undefined) ?? EMPTY_META[key];
  }

  async setMeta<K extends keyof KioskMeta>(key: K, value: KioskMeta[K]): Promise<void> {
    await this.db.put('meta', value, key);
  }

  async fileHashes(): Promise<Set<string>> {
    return new Set(await this.db.getAllKeys('files'));
  }

  file(sha256: string): Promise<StoredFile | undefined> {
    return this.db.get('files', sha256);
  }

  async putFile(file: StoredFile): Promise<void> {
    await this.db.put('files', file);
  }

  /** The downloaded part of a file, in order. */
  chunks(sha256: string): Promise<StoredChunk[]> {
    return this.db.getAll('chunks', IDBKeyRange.bound([sha256, 0], [sha256, Infinity]));
  }

  async putChunk(chunk: StoredChunk): Promise<void> {
    await this.db.put('chunks', chunk);
  }

  async clearChunks(sha256: string): Promise<void> {
    await this.db.delete('chunks', IDBKeyRange.bound([sha256, 0], [sha256, Infinity]));
  }

  release(releaseId: number): Promise<StoredRelease | undefined> {
    return this.db.get('releases', releaseId);
  }

  async putRelease(release: StoredRelease): Promise<void> {
    await this.db.put('releases', release);
  }

  /**
   * Keeps only the releases named and the files they list; files are shared across releases, so a
   * file goes only when no kept release needs it.
   */
  async keepOnly(releaseIds: readonly number[]): Promise<void> {
    const keep = new Set(releaseIds);
    const needed = new Set<string>();
    for (const release of await this.db.getAll('releases')) {
      if (!keep.has(release.releaseId)) {
        await this.db.delete('releases', release.releaseId);
        continue;
      }
      const parsed = parseManifest(release.manifestJson);
      if (parsed.ok) for (const file of parsed.manifest.files) needed.add(file.sha256);
    }
    for (const sha256 of await this.db.getAllKeys('files')) {
      if (!needed.has(sha256)) await this.db.delete('files', sha256);
    }
  }
}
