import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Venue } from './venue.model.js';

@Table({ tableName: 'galleries' })
export class Gallery extends Model {
  @ForeignKey(() => Venue)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  venueId: number;

  @BelongsTo(() => Venue)
  venue?: Venue;

  @Column({ type: DataType.STRING(160), allowNull: false })
  name: string;

  declare id: number;
}
