import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model.js';

@Table({ tableName: 'password_resets' })
export class PasswordReset extends Model {
  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  userId: number;

  @BelongsTo(() => User)
  user?: User;

  @Column({ type: DataType.CHAR(64), allowNull: false, unique: true })
  tokenHash: string;

  @Column({ type: DataType.DATE(3), allowNull: false })
  expiresAt: Date;

  @Column({ type: DataType.DATE(3), allowNull: true })
  usedAt: Date | null;

  /** A newer link was asked for, or another link of the account was used. */
  @Column({ type: DataType.DATE(3), allowNull: true })
  voidedAt: Date | null;

  declare id: number;
}
