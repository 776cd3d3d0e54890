import { Column, DataType, HasMany, Model, Table } from 'sequelize-typescript';
import type { Role } from '@mantlepiece/shared';
import { jsonColumn } from '../../database/json-column.js';
import { VenueMembership } from './venue-membership.model.js';

@Table({ tableName: 'users' })
export class User extends Model {
  @Column({ type: DataType.STRING(254), allowNull: false, unique: true })
  email: string;

  @Column({ type: DataType.STRING(120), allowNull: false })
  name: string;

  @Column({ type: DataType.STRING(255), allowNull: false })
  passwordHash: string;

  /** Roles held at every venue: the organisation admin's, and those of anyone the admin did not narrow to venues. */
  @Column(jsonColumn('roles'))
  roles: Role[];

  /** Locales a translator translates into at every venue. */
  @Column(jsonColumn('locales'))
  locales: string[];

  /** Roles and locales held at one venue each; read with the person on every request. */
  @HasMany(() => VenueMembership)
  memberships?: VenueMembership[];

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
