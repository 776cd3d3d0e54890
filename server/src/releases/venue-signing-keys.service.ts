import { createPrivateKey, generateKeyPairSync, sign } from 'node:crypto';
import { Injectable, Logger, NotFoundException, OnApplicationBootstrap } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction } from 'sequelize';
import { ConfigService } from '../config/config.service.js';
import { Venue } from '../venues/models/venue.model.js';
import { seal, sealingKey, unseal } from './key-sealing.js';
import { VenueSigningKey } from './models/venue-signing-key.model.js';

/**
 * Each venue signs its releases with its own Ed25519 key; kiosks get the public half at pairing.
 * The private half is sealed under a key derived from SIGNING_KEY_SECRET (JWT_SECRET outside
 * production), so a copy of the database alone cannot sign a release.
 */
@Injectable()
export class VenueSigningKeysService implements OnApplicationBootstrap {
  private readonly logger = new Logger('VenueSigningKeys');
  private readonly key: Buffer;

  constructor(
    @InjectModel(VenueSigningKey) private readonly keys: typeof VenueSigningKey,
    @InjectModel(Venue) private readonly venues: typeof Venue,
    config: ConfigService,
  ) {
    this.key = sealingKey(config.signingKeySecret);
  }

  /** Venues set up before keys existed (or by the seed) get theirs when the server starts. */
  async onApplicationBootstrap(): Promise<void> {
    const created = await this.createMissing();
    if (created > 0) this.logger.log(`created signing keys for ${created} venue(s)`);
  }

  async createMissing(): Promise<number> {
    const withKeys = (await this.keys.findAll({ attributes: ['venueId'] })).map((row) => row.venueId);
    const venues = await this.venues.findAll({ attributes: ['id'], where: withKeys.length ? { id: { [Op.notIn]: withKeys } } : {} });
    for (const venue of venues) await this.createFor(venue.id);
    return venues.length;
  }

  /** Makes the venue's key pair unless it has one; several instances may race, the unique key keeps one. */
  async createFor(venueId: number, transaction?: Transaction): Promise<void> {
    const { publicKey, privateKey } = generateKeyPairSync('ed25519');
    const pkcs8 = privateKey.export({ type: 'pkcs8', format: 'der' });
    await this.keys.bulkCreate(
      [{ venueId, publicKey: publicKey.export({ type: 'spki', format: 'der' }).toString('base64'), privateKeySealed: seal(this.key, pkcs8, venueId) }],
      { ignoreDuplicates: true, transaction },
    );
  }

  /** The venue's public key as base64 SPKI DER, what WebCrypto's importKey('spki') takes. */
  async publicKeyOf(venueId: number): Promise<string> {
    return (await this.find(venueId)).publicKey;
  }

  /** Base64 Ed25519 signature over the text's UTF-8 bytes. */
  async signText(venueId: number, text: string): Promise<string> {
    const row = await this.find(venueId);
    const privateKey = createPrivateKey({ key: unseal(this.key, row.privateKeySealed, venueId), format: 'der', type: 'pkcs8' });
    return sign(null, Buffer.from(text, 'utf8'), privateKey).toString('base64');
  }

  private async find(venueId: number): Promise<VenueSigningKey> {
    let row = await this.keys.findOne({ where: { venueId } });
    if (!row) {
      if (!(await this.venues.findByPk(venueId, { attributes: ['id'] }))) throw new NotFoundException('There is no such venue.');
      await this.createFor(venueId);
      row = await this.keys.findOne({ where: { venueId } });
    }
    if (!row) throw new Error(`venue ${venueId} has no signing key`);
    return row;
  }
}
