import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { NotificationKind } from '@mantlepiece/shared';
import { User } from '../../users/models/user.model.js';

/** An in-app notification, worded in its recipient's UI language when it was raised. */
@Table({ tableName: 'notifications', updatedAt: false })
export class Notification extends Model {
  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  recipientId: number;

  @Column({ type: DataType.STRING(40), allowNull: false })
  kind: NotificationKind;

  @Column({ type: DataType.STRING(255), allowNull: false })
  title: string;

  @Column({ type: DataType.TEXT, allowNull: false })
  body: string;

  /** A studio path. */
  @Column({ type: DataType.STRING(500), allowNull: false })
  link: string;

  @Column({ type: DataType.DATE(3), allowNull: true })
  readAt: Date | null;

  @Column({ type: DataType.DATE(3), allowNull: false })
  declare createdAt: Date;

  declare id: number;
}
