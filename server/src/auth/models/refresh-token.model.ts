import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model.js';

/**
 * One refresh token of a sign-in session. Each refresh rotates it to a new token of the same
 * family; presenting a rotated one again means it was stolen, so the whole family is revoked.
 */
@Table({ tableName: 'refresh_tokens' })
export class RefreshToken extends Model {
  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  userId: number;

  @Column({ type: DataType.CHAR(36), allowNull: false })
  familyId: string;

  @Column({ type: DataType.CHAR(64), allowNull: false, unique: true })
  tokenHash: string;

  @Column({ type: DataType.DATE(3), allowNull: false })
  expiresAt: Date;

  @Column({ type: DataType.DATE(3), allowNull: true })
  rotatedAt: Date | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  revokedAt: Date | null;

  declare id: number;
}
