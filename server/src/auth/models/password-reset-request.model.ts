import { Column, DataType, Model, Table } from 'sequelize-typescript';

/**
 * A request for a reset link, queued as it came: the answer to it does the same work for every
 * address, and the worker finds out later whether the address has an account.
 */
@Table({ tableName: 'password_reset_requests' })
export class PasswordResetRequest extends Model {
  @Column({ type: DataType.STRING(254), allowNull: false })
  email: string;

  @Column({ type: DataType.STRING(64), allowNull: false })
  clientAddress: string;

  @Column({ type: DataType.DATE(3), allowNull: true })
  processedAt: Date | null;

  /** The instance mailing it, until when (see ClaimQueue). */
  @Column({ type: DataType.STRING(100), allowNull: true })
  claimedBy: string | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  claimExpiresAt: Date | null;

  declare id: number;
}
