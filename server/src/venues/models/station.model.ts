import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { ORIENTATIONS, type Orientation } from '@mantlepiece/shared';
import { Gallery } from './gallery.model.js';

/** One fixed screen position in a gallery. */
@Table({ tableName: 'stations' })
export class Station extends Model {
  @ForeignKey(() => Gallery)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  galleryId: number;

  @BelongsTo(() => Gallery)
  gallery?: Gallery;

  @Column({ type: DataType.STRING(160), allowNull: false })
  name: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  screenWidthPx: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  screenHeightPx: number;

  @Column({ type: DataType.ENUM(...ORIENTATIONS), allowNull: false })
  orientation: Orientation;

  /** Height of the screen's centre above the floor; reach ranges follow local accessibility codes. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  mountingHeightMm: number;

  declare id: number;
}
