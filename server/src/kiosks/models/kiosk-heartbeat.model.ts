import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Kiosk } from './kiosk.model.js';

/** One status report of a kiosk, kept as history; the latest is also on the kiosk row. */
@Table({ tableName: 'kiosk_heartbeats', timestamps: false })
export class KioskHeartbeat extends Model {
  @ForeignKey(() => Kiosk)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  kioskId: number;

  @BelongsTo(() => Kiosk)
  kiosk?: Kiosk;

  @Column({ type: DataType.DATE(3), allowNull: false })
  receivedAt: Date;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  releaseId: number | null;

  @Column({ type: DataType.STRING(40), allowNull: false })
  appVersion: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  uptimeS: number;

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

  declare id: number;
}
