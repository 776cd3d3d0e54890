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

  declare id: number;
}
