import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** A message waiting to be sent, or sent. Written in the same transaction as what caused it. */
@Table({ tableName: 'outbox_messages' })
export class OutboxMessage extends Model {
  @Column({ type: DataType.STRING(254), allowNull: false })
  recipient: string;

  @Column({ type: DataType.STRING(255), allowNull: false })
  subject: string;

  @Column({ type: DataType.TEXT, allowNull: false })
  textBody: string;

  @Column({ type: DataType.TEXT, allowNull: false })
  htmlBody: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 })
  attempts: number;

  @Column({ type: DataType.DATE(3), allowNull: false })
  nextAttemptAt: Date;

  /** The instance sending it, until when (see ClaimQueue). */
  @Column({ type: DataType.STRING(100), allowNull: true })
  claimedBy: string | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  claimExpiresAt: Date | null;

  @Column({ type: DataType.STRING(1000), allowNull: true })
  lastError: string | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  sentAt: Date | null;

  declare id: number;
}
