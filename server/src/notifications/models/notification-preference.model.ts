import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { NotificationKind } from '@mantlepiece/shared';
import { User } from '../../users/models/user.model.js';

/** A person's choice for one kind of notification; without a row the kind is mailed. */
@Table({ tableName: 'notification_preferences', timestamps: false })
export class NotificationPreference extends Model {
  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, primaryKey: true })
  userId: number;

  @Column({ type: DataType.STRING(40), allowNull: false, primaryKey: true })
  kind: NotificationKind;

  @Column({ type: DataType.BOOLEAN, allowNull: false })
  email: boolean;
}
