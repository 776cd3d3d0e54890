import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Kiosk } from './kiosk.model.js';

/** A code an unpaired kiosk shows; the kiosk polls with its poll token until a technician enters the code. */
@Table({ tableName: 'pairing_requests' })
export class PairingRequest extends Model {
  @Column({ type: DataType.CHAR(64), allowNull: false })
  codeHash: string;

  @Column({ type: DataType.CHAR(64), allowNull: false, unique: true })
  pollTokenHash: string;

  @Column({ type: DataType.DATE(3), allowNull: false })
  expiresAt: Date;

  @ForeignKey(() => Kiosk)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  kioskId: number | null;

  @BelongsTo(() => Kiosk)
  kiosk?: Kiosk | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  collectedAt: Date | null;

  declare id: number;
}
