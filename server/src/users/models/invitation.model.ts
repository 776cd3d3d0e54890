import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { Role } from '@mantlepiece/shared';
import { jsonColumn } from '../../database/json-column.js';
import { Venue } from '../../venues/models/venue.model.js';
import { User } from './user.model.js';

/** An admin's invitation; only the hash of its link token is kept. */
@Table({ tableName: 'invitations' })
export class Invitation extends Model {
  @Column({ type: DataType.STRING(254), allowNull: false })
  email: string;

  @Column({ type: DataType.STRING(120), allowNull: false })
  name: string;

  /** The venue whose membership the invitation grants; null grants the roles at every venue. */
  @ForeignKey(() => Venue)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  venueId: number | null;

  /** Roles at the invitation's venue, or at every venue when it names none. */
  @Column(jsonColumn('roles'))
  roles: Role[];

  @Column(jsonColumn('locales'))
  locales: string[];

  @Column({ type: DataType.STRING(12), allowNull: false })
  uiLanguage: string;

  @Column({ type: DataType.CHAR(64), allowNull: false, unique: true })
  tokenHash: string;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  invitedById: number | null;

  @BelongsTo(() => User)
  invitedBy?: User;

  @Column({ type: DataType.DATE(3), allowNull: false })
  expiresAt: Date;

  @Column({ type: DataType.DATE(3), allowNull: true })
  acceptedAt: Date | null;

  declare id: number;
}
