import { z } from '../zod.js';
import { canonicalJson, sha256Hex } from '../review/revision-snapshot.js';
import type { SignedPublication } from './kiosk-api.js';
import { readSignedJson, sha256Schema } from './manifest.js';
import { verifySignedText } from './verify.js';

/**
 * Publication records (issue 11) answer the two attacks on update systems that a signed manifest
 * alone does not: a rollback (an old, correctly signed release sent again) and a freeze (the
 * kiosk kept from hearing that anything changed). Every publish or rollback of a gallery is a new
 * record with a higher `sequence`; a kiosk refuses a lower one, and a record past `expiresAt`
 * tells the kiosk that it has had no fresh word from the server since.
 */
export const PUBLICATION_FORMAT = 'mantlepiece-publication/1';

const instant = z.iso.datetime();

export const publicationRecordSchema = z.object({
  format: z.literal(PUBLICATION_FORMAT),
  galleryId: z.number().int().positive(),
  /** 1, 2, 3 … per gallery, one per publish or rollback; a re-signed record keeps its sequence. */
  sequence: z.number().int().positive(),
  releaseId: z.number().int().positive(),
  /** SHA-256 of the manifest's UTF-8 bytes: the record vouches for that manifest and no other. */
  manifestSha256: sha256Schema,
  /** When the technician published or rolled back. */
  publishedAt: instant,
  /** When the server signed this copy of the record. */
  signedAt: instant,
  expiresAt: instant,
});

export type PublicationRecord = z.output<typeof publicationRecordSchema>;

/** What a kiosk keeps of the publication it follows. */
export interface FollowedPublication {
  sequence: number;
  releaseId: number;
  expiresAt: string;
}

/** Canonical JSON (RFC 8785 key order), the bytes the venue key signs. */
export const serializePublication = (record: PublicationRecord): string => canonicalJson(record);

export type PublicationParse = { ok: true; record: PublicationRecord } | { ok: false; reason: string };

export function parsePublication(recordJson: string): PublicationParse {
  const read = readSignedJson(recordJson, publicationRecordSchema, 'The publication record', PUBLICATION_FORMAT);
  return read.ok ? { ok: true, record: read.value } : { ok: false, reason: read.message };
}

/** Expired from its `expiresAt` on, by the clock of whoever judges. */
export const publicationExpired = (expiresAt: string, now: Date): boolean => now.getTime() >= Date.parse(expiresAt);

export interface PublicationExpectations {
  galleryId: number;
  /** The highest sequence this kiosk has accepted; null before its first. */
  highestSequence: number | null;
  now: Date;
}

export type PublicationCheck = { ok: true; record: PublicationRecord; expired: boolean } | { ok: false; reason: string };

/**
 * Whether a kiosk may follow this publication: signed by the venue key, for its gallery, vouching
 * for the very manifest it came with, and no older than the one it follows. An equal sequence is
 * the same publication signed again (a later expiry). An expired record is still followed, since a
 * kiosk never goes dark; `expired` says so, for the heartbeat.
 */
export async function checkPublication(signed: SignedPublication | undefined, manifestJson: string, publicKeySpkiB64: string, expected: PublicationExpectations): Promise<PublicationCheck> {
  if (typeof signed?.record !== 'string' || typeof signed.signature !== 'string') return { ok: false, reason: 'The answer carries no publication record.' };
  if (!(await verifySignedText(signed.record, signed.signature, publicKeySpkiB64))) {
    return { ok: false, reason: 'The publication record is not signed by this venue’s key.' };
  }
  const parsed = parsePublication(signed.record);
  if (!parsed.ok) return parsed;
  const { record } = parsed;
  if (record.galleryId !== expected.galleryId) {
    return { ok: false, reason: `Publication ${record.sequence} is for gallery ${record.galleryId}, not this kiosk’s gallery ${expected.galleryId}.` };
  }
  if (record.manifestSha256 !== (await sha256Hex(manifestJson))) {
    return { ok: false, reason: `Publication ${record.sequence} vouches for another manifest than the one sent with it.` };
  }
  if (expected.highestSequence !== null && record.sequence < expected.highestSequence) {
    return { ok: false, reason: `Publication ${record.sequence} is older than publication ${expected.highestSequence}, which this kiosk already follows: an old answer sent again is refused.` };
  }
  return { ok: true, record, expired: publicationExpired(record.expiresAt, expected.now) };
}

/** The publication to keep: the higher sequence, and of two copies of one publication the later expiry. */
export function laterPublication(held: FollowedPublication | null, record: PublicationRecord): FollowedPublication {
  const offered = { sequence: record.sequence, releaseId: record.releaseId, expiresAt: record.expiresAt };
  if (!held || offered.sequence > held.sequence) return offered;
  if (offered.sequence === held.sequence && Date.parse(offered.expiresAt) > Date.parse(held.expiresAt)) return offered;
  return held;
}
