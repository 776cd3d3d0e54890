import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model.js';
import { Venue } from '../../venues/models/venue.model.js';
import { BeforeAnyChange } from '../../database/append-only.js';
import { jsonColumn } from '../../database/json-column.js';

/** Append-only: the model itself refuses updates and deletes, whatever code asks. */
@Table({ tableName: 'audit_events', updatedAt: false })
export class AuditEvent extends Model {
  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  actorId: number | null;

  @BelongsTo(() => User)
  actor?: User | null;

  @Column({ type: DataType.STRING(64), allowNull: false })
  action: string;

  @Column({ type: DataType.STRING(32), allowNull: true })
  targetType: string | null;

  @Column({ type: DataType.STRING(64), allowNull: true })
  targetId: string | null;

  /** The venue the event is about; null for an organisation-wide one. */
  @ForeignKey(() => Venue)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  venueId: number | null;

  @BelongsTo(() => Venue)
  venue?: Venue | null;

  @Column(jsonColumn('detail', true))
  detail: Record<string, unknown> | null;

  @Column({ type: DataType.STRING(64), allowNull: true })
  clientAddress: string | null;

  @Column({ type: DataType.DATE(3), allowNull: false })
  declare createdAt: Date;

  declare id: number;

  @BeforeAnyChange
  static refuseChange(): never {
    throw new Error('Audit events are append-only');
  }
}
