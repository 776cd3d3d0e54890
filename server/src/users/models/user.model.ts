import { Column, DataType, Model, Table } from 'sequelize-typescript';
import type { Role } from '@mantlepiece/shared';
import { jsonColumn } from '../../database/json-column.js';

@Table({ tableName: 'users' })
export class User extends Model {
  @Column({ type: DataType.STRING(254), allowNull: false, unique: true })
  email: string;

  @Column({ type: DataType.STRING(120), allowNull: false })
  name: string;

  @Column({ type: DataType.STRING(255), allowNull: false })
  passwordHash: string;

  @Column(jsonColumn('roles'))
  roles: Role[];

  @Column(jsonColumn('locales'))
  locales: string[];

  @Column({ type: DataType.STRING(12), allowNull: false, defaultValue: 'en' })
  uiLanguage: string;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: true })
  active: boolean;

  @Column({ type: DataType.DATE(3), allowNull: true })
  lastSignInAt: Date | null;

  declare id: number;
  declare createdAt: Date;
  declare updatedAt: Date;
}
