import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** A periodic task that one server instance at a time may run, held by the instance named in `claimedBy` until `claimExpiresAt`. */
@Table({ tableName: 'job_leases', timestamps: false })
export class JobLease extends Model {
  @Column({ type: DataType.STRING(64), primaryKey: true })
  declare name: string;

  @Column({ type: DataType.STRING(100), allowNull: true })
  claimedBy: string | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  claimExpiresAt: Date | null;
}
