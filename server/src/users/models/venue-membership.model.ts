import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { Role } from '@mantlepiece/shared';
import { jsonColumn } from '../../database/json-column.js';
import { Venue } from '../../venues/models/venue.model.js';
import { User } from './user.model.js';

/** The roles (and, for a translator, the locales) a person holds at one venue. */
@Table({ tableName: 'venue_memberships' })
export class VenueMembership extends Model {
  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  userId: number;

  @ForeignKey(() => Venue)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  venueId: number;

  @BelongsTo(() => Venue)
  venue?: Venue;

  @Column(jsonColumn('roles'))
  roles: Role[];

  @Column(jsonColumn('locales'))
  locales: string[];

  declare id: number;
}
