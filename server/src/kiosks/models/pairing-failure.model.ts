import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** A wrong pairing code entered at a station, counted to throttle guessing. */
@Table({ tableName: 'pairing_failures', updatedAt: false })
export class PairingFailure extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  stationId: number;

  @Column({ type: DataType.STRING(64), allowNull: false })
  clientAddress: string;

  @Column({ type: DataType.DATE(3), allowNull: false })
  declare createdAt: Date;
}
