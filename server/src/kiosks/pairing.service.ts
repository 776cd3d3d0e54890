import { randomInt } from 'node:crypto';
import { GoneException, Injectable, NotFoundException, UnprocessableEntityException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { normalisePairingCode, PAIRING_ALPHABET, PAIRING_CODE_LENGTH, type KioskCredential, type PairCompleteWaiting, type PairStartResponse } from '@mantlepiece/shared';
import { AuditService } from '../audit/audit.service.js';
import type { Member } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { hashToken, newToken } from '../common/tokens.js';
import { actingAt, withinReach } from '../common/venue-boundary.js';
import { VenueSigningKeysService } from '../releases/venue-signing-keys.service.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Station } from '../venues/models/station.model.js';
import { newDeviceToken } from './device-token.js';
import { FLEET_KEEPERS } from './kiosk-policy.js';
import { Kiosk } from './models/kiosk.model.js';
import { PairingRequest } from './models/pairing-request.model.js';
import { PairingAttemptsService } from './pairing-attempts.service.js';

export const PAIRING_TTL_MS = 10 * 60_000;

const newPairingCode = () => Array.from({ length: PAIRING_CODE_LENGTH }, () => PAIRING_ALPHABET[randomInt(PAIRING_ALPHABET.length)]).join('');

@Injectable()
export class PairingService {
  constructor(
    @InjectModel(PairingRequest) private readonly requests: typeof PairingRequest,
    @InjectModel(Kiosk) private readonly kiosks: typeof Kiosk,
    @InjectModel(Station) private readonly stations: typeof Station,
    private readonly attempts: PairingAttemptsService,
    private readonly keys: VenueSigningKeysService,
    private readonly audit: AuditService,
    private readonly clock: Clock,
    private readonly sequelize: Sequelize,
  ) {}

  /** A new code for an unpaired kiosk to show, and the poll token it asks with; so many per client address. Only hashes are kept. */
  async start(clientAddress: string): Promise<PairStartResponse> {
    await this.attempts.takeStart(clientAddress);
    const expiresAt = this.clock.fromNow(PAIRING_TTL_MS);
    let code = newPairingCode();
    // Two screens showing the same code at once would make a technician pair the wrong one.
    while (await this.requests.count({ where: { codeHash: hashToken(code), expiresAt: { [Op.gt]: this.clock.now() }, kioskId: null } })) code = newPairingCode();
    const pollToken = newToken();
    await this.requests.create({ codeHash: hashToken(code), pollTokenHash: hashToken(pollToken), expiresAt });
    return { pairingCode: code, pollToken, expiresAt: expiresAt.toISOString() };
  }

  /**
   * Waiting until a technician enters the code; then, once, the device token (made here, so it is
   * never stored anywhere but on the kiosk) and the venue's public key.
   */
  async complete(pollToken: string): Promise<PairCompleteWaiting | KioskCredential> {
    return this.sequelize.transaction(async (transaction) => {
      const request = await this.requests.findOne({ where: { pollTokenHash: hashToken(pollToken) }, transaction, lock: transaction.LOCK.UPDATE });
      if (!request) throw new NotFoundException('There is no such pairing request; start again.');
      if (request.collectedAt) throw new GoneException('This pairing has been completed already; start again to pair anew.');
      if (request.kioskId === null) {
        if (request.expiresAt <= this.clock.now()) throw new GoneException('This pairing code has expired; start again for a new one.');
        return { status: 'waiting' as const };
      }
      const kiosk = await this.kiosks.findByPk(request.kioskId, { include: [{ model: Station, include: [Gallery] }], transaction, lock: transaction.LOCK.UPDATE });
      if (!kiosk?.station?.gallery || kiosk.revokedAt) throw new GoneException('This kiosk was unpaired before it finished pairing; start again.');
      const deviceToken = newDeviceToken();
      await kiosk.update({ deviceTokenHash: hashToken(deviceToken) }, { transaction });
      await request.update({ collectedAt: this.clock.now() }, { transaction });
      const galleryId = kiosk.station.galleryId;
      return { deviceToken, kioskId: kiosk.id, galleryId, stationId: kiosk.stationId, publicKey: await this.keys.publicKeyOf(kiosk.station.gallery.venueId) };
    });
  }

  /**
   * Binds the kiosk showing the code to the station. A kiosk paired to the station before is
   * unpaired: a station is one screen. Each check is taken from the limits first; a right one is given back.
   */
  async pairStation(stationId: number, typedCode: string, technician: Member, clientAddress: string): Promise<{ kioskId: number }> {
    const station = await this.stations.findByPk(stationId, { include: [{ model: Gallery, attributes: ['id', 'venueId'] }] });
    const { venueId } = withinReach(technician, station?.gallery, 'There is no such station.');
    actingAt(technician, venueId, FLEET_KEEPERS);
    const check = await this.attempts.takeCheck(stationId, clientAddress);
    const kioskId = await this.sequelize.transaction(async (transaction) => {
      const now = this.clock.now();
      const request = await this.requests.findOne({
        where: { codeHash: hashToken(normalisePairingCode(typedCode)), kioskId: null, expiresAt: { [Op.gt]: now } },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (!request) return null;
      const replaced = await this.kiosks.findAll({ where: { stationId, revokedAt: null }, attributes: ['id'], transaction });
      await this.kiosks.update({ revokedAt: now, deviceTokenHash: null }, { where: { stationId, revokedAt: null }, transaction });
      const kiosk = await this.kiosks.create({ stationId, pairedAt: now, pairedById: technician.id }, { transaction });
      await request.update({ kioskId: kiosk.id }, { transaction });
      await this.audit.record({
        actorId: technician.id, action: 'kiosk.paired', targetType: 'kiosk', targetId: kiosk.id, venueId,
        detail: { stationId, galleryId: station!.galleryId, replacedKioskIds: replaced.map((k) => k.id) }, clientAddress,
      }, transaction);
      return kiosk.id;
    });
    if (kioskId === null) {
      throw new UnprocessableEntityException({
        statusCode: 422,
        message: 'No kiosk is showing this code.',
        errors: [{ path: ['pairingCode'], message: 'No kiosk is showing this code, or it has expired. Check the screen and type it again.' }],
      });
    }
    await this.attempts.checkSucceeded(check);
    return { kioskId };
  }
}
