import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** How much of one limit one subject (an account, a client address, a station) has used in its window. */
@Table({ tableName: 'rate_limits', timestamps: false })
export class RateLimitCounter extends Model {
  @Column({ type: DataType.STRING(40), allowNull: false })
  scope: string;

  @Column({ type: DataType.STRING(330), allowNull: false })
  subject: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 })
  count: number;

  @Column({ type: DataType.DATE(3), allowNull: false })
  windowStartedAt: Date;

  /** For a slow-down: the next take must wait until then. */
  @Column({ type: DataType.DATE(3), allowNull: true })
  notBefore: Date | null;

  declare id: number;
}
