import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model.js';

/** A translator locale that has been announced to its holder by mail. */
@Table({ tableName: 'translator_assignments', timestamps: false })
export class TranslatorAssignment extends Model {
  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  userId: number;

  @Column({ type: DataType.STRING(35), allowNull: false })
  locale: string;

  @Column({ type: DataType.DATE(3), allowNull: false })
  notifiedAt: Date;

  declare id: number;
}
