/**
 * Where media bytes live, by key. Keys are content-addressed (`originals/<sha256>`,
 * `renditions/<sha256>/<width>.webp`), so a put never changes what an existing key means.
 * The local filesystem serves one machine; an S3-compatible store implements the same four calls.
 */
export interface MediaStore {
  put(key: string, data: Buffer): Promise<void>;
  get(key: string): Promise<Buffer | null>;
  exists(key: string): Promise<boolean>;
  remove(key: string): Promise<void>;
}

export const MEDIA_STORE = Symbol('MediaStore');

export const originalKey = (sha256: string) => `originals/${sha256}`;
export const renditionKey = (sha256: string, width: number) => `renditions/${sha256}/${width}.webp`;
