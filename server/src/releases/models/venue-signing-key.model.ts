import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Venue } from '../../venues/models/venue.model.js';

/** A venue's Ed25519 key pair; the private half only ever sealed. */
@Table({ tableName: 'venue_signing_keys' })
export class VenueSigningKey extends Model {
  @ForeignKey(() => Venue)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, unique: true })
  venueId: number;

  @BelongsTo(() => Venue)
  venue?: Venue;

  /** Base64 SPKI DER. */
  @Column({ type: DataType.STRING(120), allowNull: false })
  publicKey: string;

  @Column({ type: DataType.STRING(400), allowNull: false })
  privateKeySealed: string;

  declare id: number;
}
