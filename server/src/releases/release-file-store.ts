import { createHash } from 'node:crypto';
import { Transform } from 'node:stream';
import { Inject, Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import { MEDIA_STORE, type MediaStore } from '../media/media-store.js';
import { storedObject, type StoredObjectSource } from '../media/stored-file-response.js';
import { ReleaseFile } from './models/release-file.model.js';

/** Release files by hash, apart from the media library's keys, so deleting an image never breaks a release. */
export const releaseFileKey = (sha256: string) => `releases/${sha256}`;

export const sha256Of = (data: Buffer): string => createHash('sha256').update(data).digest('hex');

export interface StoredFile {
  sha256: string;
  size: number;
  mime: string;
}

/**
 * The content-addressed half of releases, in the same store as media. A hash is written once and
 * shared by every release that lists it; a file goes when the last release row naming it goes.
 */
@Injectable()
export class ReleaseFileStore {
  constructor(
    @Inject(MEDIA_STORE) private readonly store: MediaStore,
    @InjectModel(ReleaseFile) private readonly files: typeof ReleaseFile,
  ) {}

  /**
   * Lists the file on the release, then streams its bytes from `sourceKey` in the same store unless
   * an earlier release stored them already. Listing first lets a clean-up running at the same
   * moment see the row and keep the bytes. Bytes that do not hash to `file.sha256` fail the copy
   * before it is stored.
   */
  async copy(releaseId: number, file: StoredFile, sourceKey: string): Promise<void> {
    await this.files.bulkCreate([{ releaseId, ...file }], { ignoreDuplicates: true });
    const key = releaseFileKey(file.sha256);
    if (await this.store.exists(key)) return;
    const source = await this.store.open(sourceKey);
    if (!source) throw new Error(`The rendition ${sourceKey} is missing from the media store.`);
    const checked = hashChecked(file.sha256, sourceKey);
    source.body.once('error', (error) => checked.destroy(error));
    await this.store.put(key, source.body.pipe(checked));
  }

  /** The hashes the release lists whose bytes are not in the store. */
  async missing(releaseId: number): Promise<string[]> {
    const rows = await this.files.findAll({ where: { releaseId }, attributes: ['sha256'] });
    const present = await Promise.all(rows.map((row) => this.store.exists(releaseFileKey(row.sha256))));
    return rows.filter((_, i) => !present[i]).map((row) => row.sha256);
  }

  source(sha256: string): StoredObjectSource {
    return storedObject(this.store, releaseFileKey(sha256));
  }

  /** A short-lived URL of the file in the bucket, or null on the local disk. */
  presignedUrl(sha256: string, mime: string, expiresInS: number): Promise<string | null> {
    return this.store.presignedUrl(releaseFileKey(sha256), { contentType: mime, expiresInS });
  }

  /** Forgets the release's files and deletes the bytes no other release lists. */
  async discard(releaseId: number): Promise<string[]> {
    const own = (await this.files.findAll({ where: { releaseId }, attributes: ['sha256'] })).map((row) => row.sha256);
    await this.files.destroy({ where: { releaseId } });
    if (own.length === 0) return [];
    const stillListed = new Set(
      (await this.files.findAll({ where: { sha256: { [Op.in]: own } }, attributes: ['sha256'] })).map((row) => row.sha256),
    );
    const orphans = own.filter((sha256) => !stillListed.has(sha256));
    for (const sha256 of orphans) await this.store.remove(releaseFileKey(sha256));
    return orphans;
  }
}

/** Passes bytes through, and errs at their end, before the writer sees it, unless they hash to `sha256`. */
function hashChecked(sha256: string, sourceKey: string): Transform {
  const hash = createHash('sha256');
  return new Transform({
    transform(chunk: Buffer, _encoding, done) {
      hash.update(chunk);
      done(null, chunk);
    },
    flush(done) {
      done(hash.digest('hex') === sha256 ? null : new Error(`The rendition ${sourceKey} does not match its SHA-256.`));
    },
  });
}
