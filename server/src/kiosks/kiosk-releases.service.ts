import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type WhereOptions } from 'sequelize';
import type { KioskManifestResponse } from '@mantlepiece/shared';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';
import type { StoredObjectSource } from '../media/stored-file-response.js';
import { ReleaseFile } from '../releases/models/release-file.model.js';
import { Release } from '../releases/models/release.model.js';
import { PublicationsService, type PublicationVersion } from '../releases/publications.service.js';
import { ReleaseFileStore, sha256Of } from '../releases/release-file-store.js';
import type { PairedKiosk } from './device-token.guard.js';

/** The gallery's releases its kiosks may fetch from: the Live one, and those a kiosk may still hold to roll back to. */
export const servableReleasesOf = (galleryId: number): WhereOptions<Release> => ({ galleryId, state: { [Op.in]: ['live', 'superseded'] } });

/** The gallery's signed answer as sent, and its ETag: the SHA-256 of the publication record. */
export interface LiveManifest {
  etag: string;
  body: Buffer;
}

interface CachedManifest extends LiveManifest {
  version: PublicationVersion;
  /** From then on the record is signed again, which only the uncached path does. */
  resignsAt: number;
}

/** A release file a kiosk may have: where to send it, or what to stream. */
export interface KioskFile {
  mime: string;
  redirectTo: string | null;
  source: StoredObjectSource;
}

/**
 * What a paired kiosk reads: its gallery's live manifest and the files of its releases. Kiosks
 * poll the manifest all day, so the signed answer is kept per gallery, serialised, and served
 * again while the gallery's latest publication is the same one, signed the same time. The
 * device-token guard reads that from the database on every request, so a publish, rollback or
 * re-signing on any server instance is seen at the next poll.
 */
@Injectable()
export class KioskReleasesService {
  private readonly manifests = new Map<number, CachedManifest>();

  constructor(
    @InjectModel(ReleaseFile) private readonly releaseFiles: typeof ReleaseFile,
    private readonly publications: PublicationsService,
    private readonly files: ReleaseFileStore,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {}

  /**
   * The release of the gallery's latest publication (the Live one) as signed, with that
   * publication's signed record; null while the gallery has nothing published. The guard read
   * which publication is the latest, with the kiosk.
   */
  async liveManifest(kiosk: PairedKiosk): Promise<LiveManifest | null> {
    const { station: { galleryId }, latestPublication } = kiosk;
    if (!latestPublication) return null;
    const cached = this.manifests.get(galleryId);
    if (cached && sameVersion(cached.version, latestPublication) && this.clock.now().getTime() < cached.resignsAt) return cached;
    return this.signedAnswer(galleryId);
  }

  /** A file of one of the gallery's servable releases; any other hash is unknown to this kiosk. */
  async file(galleryId: number, sha256: string): Promise<KioskFile> {
    const listed = await this.releaseFiles.findOne({
      where: { sha256 },
      attributes: ['mime'],
      include: [{ model: Release, attributes: [], where: servableReleasesOf(galleryId) }],
    });
    if (!listed) throw new NotFoundException('This gallery has no such file.');
    const seconds = this.config.presignedUrlSeconds;
    const redirectTo = seconds > 0 ? await this.files.presignedUrl(sha256, listed.mime, seconds) : null;
    return { mime: listed.mime, redirectTo, source: this.files.source(sha256) };
  }

  /** Reads (and if need be signs again) the latest publication, and keeps the answer for the requests after. */
  private async signedAnswer(galleryId: number): Promise<LiveManifest | null> {
    const latest = await this.publications.latestSigned(galleryId);
    const release = latest?.release;
    if (!latest || !release?.manifest || !release.signature) return null;
    const { id, record, signature, expiresAt } = latest.publication;
    const answer: KioskManifestResponse = { manifest: release.manifest, signature: release.signature, publication: { record, signature } };
    const cached: CachedManifest = {
      etag: `"${sha256Of(Buffer.from(record, 'utf8'))}"`,
      body: Buffer.from(JSON.stringify(answer), 'utf8'),
      version: { id, expiresAt },
      resignsAt: this.publications.resignsAt(expiresAt!),
    };
    this.manifests.set(galleryId, cached);
    return cached;
  }
}

const sameVersion = (a: PublicationVersion, b: PublicationVersion) => a.id === b.id && a.expiresAt?.getTime() === b.expiresAt?.getTime();
