import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type { FollowedPublication, KioskCredential, KioskEvent } from '@mantlepiece/shared/kiosk';

/** A file of a release, checked against its SHA-256 before it is stored here. */
export interface StoredFile {
  sha256: string;
  mime: string;
  bytes: ArrayBuffer;
}

/** Part of a file downloaded so far, kept so a broken download resumes where it stopped. */
export interface StoredChunk {
  sha256: string;
  offset: number;
  bytes: ArrayBuffer;
}

/** A release whose signature and every file checked: it can be played from storage alone. */
export interface StoredRelease {
  releaseId: number;
  manifestJson: string;
  signature: string;
  storedAt: string;
}

/**
 * A release refused because a file failed its hash. The same manifest is not downloaded again
 * until `retryAt`, which moves further out after each refusal; a changed manifest is tried at once.
 */
export interface ReleaseRefusal {
  releaseId: number;
  /** SHA-256 of the refused manifest: the manifest has changed when this does. */
  manifestSha256: string;
  /** The answer's ETag, sent back while backing off so an unchanged publication costs a 304. */
  etag: string | null;
  reason: string;
  attempts: number;
  retryAt: string;
}

/** Which releases the kiosk plays, kept and may switch to, and what to tell the next heartbeat. */
export interface KioskMeta {
  current: number | null;
  previous: number | null;
  /** Ready and waiting for the attract loop. */
  pending: number | null;
  manifestEtag: string | null;
  lastError: string | null;
  /**
   * The publication the kiosk follows: never replaced by a lower sequence, so an old answer sent
   * again is refused (issue 11).
   */
  publication: FollowedPublication | null;
  refusal: ReleaseRefusal | null;
  /** When a technician's revocation was carried out here; shown on the pairing screen until paired anew. */
  unpairedAt: string | null;
}

interface KioskSchema extends DBSchema {
  credential: { key: 'device'; value: KioskCredential };
  files: { key: string; value: StoredFile };
  chunks: { key: [string, number]; value: StoredChunk };
  releases: { key: number; value: StoredRelease };
  meta: { key: keyof KioskMeta; value: KioskMeta[keyof KioskMeta] };
  outbox: { key: string; value: KioskEvent; indexes: { byTime: string } };
}

export type KioskDb = IDBPDatabase<KioskSchema>;

export const KIOSK_DB_NAME = 'mantlepiece-kiosk';

export function openKioskDb(name = KIOSK_DB_NAME): Promise<KioskDb> {
  return openDB<KioskSchema>(name, 1, {
    upgrade(db) {
      db.createObjectStore('credential');
      db.createObjectStore('files', { keyPath: 'sha256' });
      db.createObjectStore('chunks', { keyPath: ['sha256', 'offset'] });
      db.createObjectStore('releases', { keyPath: 'releaseId' });
      db.createObjectStore('meta');
      db.createObjectStore('outbox', { keyPath: 'id' }).createIndex('byTime', 'at');
    },
  });
}
