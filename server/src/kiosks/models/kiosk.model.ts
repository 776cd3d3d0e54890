import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Station } from '../../venues/models/station.model.js';

/** A device paired to a station; its gallery is its station's. */
@Table({ tableName: 'kiosks' })
export class Kiosk extends Model {
  @ForeignKey(() => Station)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  stationId: number;

  @BelongsTo(() => Station)
  station?: Station;

  /** SHA-256 of the device token; null until the kiosk collects it, and again once revoked. */
  @Column({ type: DataType.CHAR(64), allowNull: true, unique: true })
  deviceTokenHash: string | null;

  @Column({ type: DataType.DATE(3), allowNull: false })
  pairedAt: Date;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  pairedById: number | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  revokedAt: Date | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  lastHeartbeatAt: Date | null;

  /** The release the kiosk last said it plays. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  lastReleaseId: number | null;

  @Column({ type: DataType.STRING(40), allowNull: true })
  appVersion: string | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  uptimeS: number | null;

  @Column({ type: DataType.BIGINT.UNSIGNED, allowNull: true })
  storageUsedBytes: number | null;

  @Column({ type: DataType.STRING(1000), allowNull: true })
  lastError: string | null;

  /** The publication the kiosk said it follows, and whether it said that had expired (issue 11). */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  publicationSequence: number | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  publicationExpiresAt: Date | null;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: false })
  publicationExpired: boolean;

  /** The demo venue's invented kiosk: no device behind it, its heartbeats and visitor events made up by the seed. */
  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: false })
  demo: boolean;

  /** When technicians were told it went silent; cleared when told it is back (the fleet watcher's). */
  @Column({ type: DataType.DATE(3), allowNull: true })
  silenceAlertedAt: Date | null;

  declare id: number;
}
