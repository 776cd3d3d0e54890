import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import { PUBLICATION_FORMAT, serializePublication } from '@mantlepiece/shared';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';
import type { Person } from '../auth/policy.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Publication, type PublicationKind } from './models/publication.model.js';
import { Release } from './models/release.model.js';
import { VenueSigningKeysService } from './venue-signing-keys.service.js';

const DAY_MS = 86_400_000;

/** A gallery's latest publication with its record signed, and the release it points at. */
export interface SignedPublicationOf {
  publication: Publication & { record: string; signature: string };
  release: Release;
}

/** One signing of a gallery's latest publication. */
export interface PublicationVersion {
  id: number;
  expiresAt: Date | null;
}

/**
 * Publication records (issue 11): every publish or rollback of a gallery gets the next `sequence`,
 * and a record signed with the venue key that kiosks follow and never go back from. A record
 * holds for PUBLICATION_LIFETIME_DAYS; it is signed again, same sequence, later expiry, when a
 * kiosk asks for it past half that lifetime, so a gallery whose kiosks reach the server never
 * sees it expire, and a kiosk kept from the server learns it has had no fresh word.
 */
@Injectable()
export class PublicationsService {
  private readonly lifetimeMs: number;

  constructor(
    @InjectModel(Publication) private readonly publications: typeof Publication,
    @InjectModel(Release) private readonly releases: typeof Release,
    @InjectModel(Gallery) private readonly galleries: typeof Gallery,
    private readonly keys: VenueSigningKeysService,
    private readonly clock: Clock,
    config: ConfigService,
  ) {
    this.lifetimeMs = config.publicationLifetimeDays * DAY_MS;
  }

  /**
   * Numbers a publish or rollback of `release`. Runs inside the publish transaction, which holds
   * the gallery's row locked, so two publishes (on any server instance) cannot take one sequence;
   * the latest is read with a lock as well, and the unique key is the last guard.
   */
  async record(release: Release, kind: PublicationKind, user: Person, now: Date, transaction: Transaction): Promise<Publication> {
    const last = await this.publications.findOne({ where: { galleryId: release.galleryId }, order: [['sequence', 'DESC']], attributes: ['sequence'], transaction, lock: transaction.LOCK.UPDATE });
    return this.publications.create(
      { galleryId: release.galleryId, sequence: (last?.sequence ?? 0) + 1, releaseId: release.id, kind, publishedAt: now, publishedById: user.id },
      { transaction },
    );
  }

  /** The gallery's latest publication, signed, and signed again first when past half its lifetime; null before the first publish. */
  async latestSigned(galleryId: number): Promise<SignedPublicationOf | null> {
    const publication = await this.publications.findOne({ where: { galleryId }, order: [['sequence', 'DESC']], include: [Release] });
    if (!publication?.release) return null;
    if (this.needsSigning(publication)) await this.sign(publication);
    return { publication: publication as SignedPublicationOf['publication'], release: publication.release };
  }

  /** When a record that expires at `expiresAt` is signed again: half its lifetime before. */
  resignsAt(expiresAt: Date): number {
    return expiresAt.getTime() - this.lifetimeMs / 2;
  }

  /**
   * Signs the record with a fresh expiry. Two instances may sign at once: the update is
   * conditional on the copy this one read, and the loser takes the winner's copy.
   */
  async sign(publication: Publication): Promise<void> {
    const release = publication.release ?? (await this.releases.findByPk(publication.releaseId, { attributes: ['id', 'manifestSha256'] }));
    const gallery = await this.galleries.findByPk(publication.galleryId, { attributes: ['id', 'venueId'] });
    if (!release?.manifestSha256 || !gallery) throw new Error(`publication ${publication.id} points at a release without a signed manifest`);
    const signedAt = this.clock.now();
    const expiresAt = new Date(signedAt.getTime() + this.lifetimeMs);
    const record = serializePublication({
      format: PUBLICATION_FORMAT,
      galleryId: publication.galleryId,
      sequence: publication.sequence,
      releaseId: publication.releaseId,
      manifestSha256: release.manifestSha256,
      publishedAt: publication.publishedAt.toISOString(),
      signedAt: signedAt.toISOString(),
      expiresAt: expiresAt.toISOString(),
    });
    const signature = await this.keys.signText(gallery.venueId, record);
    await this.publications.update({ record, signature, expiresAt }, { where: { id: publication.id, expiresAt: publication.expiresAt ?? null } });
    await publication.reload({ attributes: ['record', 'signature', 'expiresAt'] });
  }

  private needsSigning(publication: Publication): boolean {
    if (!publication.record || !publication.signature || !publication.expiresAt) return true;
    return this.clock.now().getTime() >= this.resignsAt(publication.expiresAt);
  }
}
