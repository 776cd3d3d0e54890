import type { Readable } from 'node:stream';

/** Bytes `start` to `end` of an object, both included (HTTP's Range arithmetic). */
export interface ByteRange {
  start: number;
  end: number;
}

/** An opened object: its whole size, and a stream of the bytes asked for (all, or one range). */
export interface OpenedObject {
  size: number;
  body: Readable;
  range?: ByteRange;
}

/** What a client is told about an object it is sent to fetch directly from the store. */
export interface PresignOptions {
  contentType: string;
  expiresInS: number;
}

/**
 * Where media originals, renditions and release files live, by key: on the local disk under
 * DATA_DIR (one machine) or in an S3-compatible bucket (several server instances). Keys are
 * content-addressed (`originals/<sha256>`, `renditions/<sha256>/<width>.webp`, `releases/<sha256>`),
 * so a put never changes what an existing key means. A put is whole or nothing: a reader sees the
 * old object or the new one, never part of one.
 */
export interface MediaStore {
  /** A stream is written as it comes (multipart to S3), never gathered in memory first. */
  put(key: string, data: Buffer | Readable, contentType?: string): Promise<void>;
  /** The whole object in memory: only for images that are decoded anyway (sharp wants a buffer). */
  get(key: string): Promise<Buffer | null>;
  /** A stream of the object, or of one byte range of it; null when there is no such object. */
  open(key: string, range?: ByteRange): Promise<OpenedObject | null>;
  /** The object's size in bytes; null when there is no such object. */
  size(key: string): Promise<number | null>;
  exists(key: string): Promise<boolean>;
  remove(key: string): Promise<void>;
  /** A short-lived URL a client may fetch the object from itself, or null when the store cannot give one (the local disk). */
  presignedUrl(key: string, options: PresignOptions): Promise<string | null>;
}

export const MEDIA_STORE = Symbol('MediaStore');

export const originalKey = (sha256: string) => `originals/${sha256}`;
export const renditionKey = (sha256: string, width: number) => `renditions/${sha256}/${width}.webp`;

const KEY = /^[a-z]+(\/[A-Za-z0-9._-]+)+$/;

/** Keys come from our own code, but one that could climb out of its root or bucket prefix is refused anyway. */
export function checkedKey(key: string): string {
  if (!KEY.test(key) || key.split('/').some((part) => part === '..' || part === '.')) throw new Error(`not a media key: ${key}`);
  return key;
}
