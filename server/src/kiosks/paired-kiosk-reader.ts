import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { QueryTypes } from 'sequelize';
import { hashToken } from '../common/tokens.js';
import { ConfigService } from '../config/config.service.js';
import type { PairedKiosk } from './device-token.guard.js';
import { Kiosk } from './models/kiosk.model.js';

interface PairedKioskRow {
  id: number;
  stationId: number;
  galleryId: number;
  publicationId: number | null;
  publicationExpiresAt: Date | null;
  deviceTokenHash: string;
}

/**
 * The kiosks of some device tokens, each with its gallery and that gallery's latest publication: a
 * lookup on the unique token-hash key, the station's primary key and the unique (gallery, sequence)
 * key per token.
 */
const PAIRED_KIOSKS = `SELECT k.id, k.station_id AS stationId, s.gallery_id AS galleryId, p.id AS publicationId, p.expires_at AS publicationExpiresAt,
    k.device_token_hash AS deviceTokenHash
  FROM kiosks k
  JOIN stations s ON s.id = k.station_id
  LEFT JOIN publications p ON p.id = (SELECT latest.id FROM publications latest WHERE latest.gallery_id = s.gallery_id ORDER BY latest.sequence DESC LIMIT 1)
  WHERE k.device_token_hash IN (?) AND k.revoked_at IS NULL`;

/** Two, so that the polls arriving during one read need not wait for its answer before theirs starts. */
const READS_AT_ONCE = 2;

interface Waiting {
  resolve: (kiosk: PairedKiosk | undefined) => void;
  reject: (error: unknown) => void;
}

/**
 * Reads paired kiosks by device-token hash for the device-token guard, at most READS_AT_ONCE reads
 * in flight: the polls that arrive while they run wait for the next one, which answers them all.
 * Each poll is thus answered from a read that began after it arrived, so a revocation, a publish
 * or a re-signing committed on any instance counts at that kiosk's next poll as before; what a
 * busy instance saves is the database round trip per poll, which bounded the poll rate while the
 * server and MariaDB sat mostly idle. Even so each poll waits for a read; with
 * PAIRED_KIOSK_RECHECK_MS set, a read also answers its kiosk's requests for that long after it began.
 */
@Injectable()
export class PairedKioskReader {
  private waiting = new Map<string, Waiting[]>();
  private reads = 0;
  /** Paired kiosks by token hash, with when their read began (performance.now()), while PAIRED_KIOSK_RECHECK_MS allows; an unknown token is never kept. */
  private recent = new Map<string, { kiosk: PairedKiosk; readAt: number }>();

  constructor(
    @InjectModel(Kiosk) private readonly kiosks: typeof Kiosk,
    private readonly config: ConfigService,
  ) {}

  /** The paired kiosk of a device token; undefined for an unknown or revoked one. */
  read(token: string): Promise<PairedKiosk | undefined> {
    const tokenHash = hashToken(token);
    const recent = this.recent.get(tokenHash);
    if (recent && performance.now() - recent.readAt < this.config.pairedKioskRecheckMs) return Promise.resolve(recent.kiosk);
    return new Promise((resolve, reject) => {
      const queue = this.waiting.get(tokenHash);
      if (queue) queue.push({ resolve, reject });
      else this.waiting.set(tokenHash, [{ resolve, reject }]);
      if (this.reads < READS_AT_ONCE) void this.readWaiting();
    });
  }

  private async readWaiting(): Promise<void> {
    this.reads += 1;
    while (this.waiting.size > 0) {
      const batch = this.waiting;
      this.waiting = new Map();
      try {
        // From the primary even with replicas: a revocation must count at once, and one read serves many polls.
        const readAt = performance.now();
        const rows = await this.kiosks.sequelize!.query<PairedKioskRow>(PAIRED_KIOSKS, { replacements: [[...batch.keys()]], type: QueryTypes.SELECT, useMaster: true });
        const byHash = new Map(rows.map((row) => [row.deviceTokenHash, pairedKioskOf(row)]));
        for (const [hash, queue] of batch) {
          const kiosk = byHash.get(hash);
          this.keep(hash, kiosk, readAt);
          for (const { resolve } of queue) resolve(kiosk);
        }
      } catch (error) {
        for (const queue of batch.values()) for (const { reject } of queue) reject(error);
      }
    }
    this.reads -= 1;
  }

  private keep(tokenHash: string, kiosk: PairedKiosk | undefined, readAt: number): void {
    // With the recheck off (the default) nothing is ever kept, so there is nothing to do.
    if (this.config.pairedKioskRecheckMs === 0) return;
    if (kiosk) this.recent.set(tokenHash, { kiosk, readAt });
    else this.recent.delete(tokenHash);
  }
}

const pairedKioskOf = (row: PairedKioskRow): PairedKiosk => ({
  id: row.id,
  stationId: row.stationId,
  station: { id: row.stationId, galleryId: row.galleryId },
  latestPublication: row.publicationId === null ? null : { id: row.publicationId, expiresAt: row.publicationExpiresAt },
});
