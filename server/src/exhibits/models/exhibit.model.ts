import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Gallery } from '../../venues/models/gallery.model.js';

/** A themed group of stories in a gallery. */
@Table({ tableName: 'exhibits' })
export class Exhibit extends Model {
  @ForeignKey(() => Gallery)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  galleryId: number;

  @BelongsTo(() => Gallery)
  gallery?: Gallery;

  @Column({ type: DataType.STRING(160), allowNull: false })
  name: string;

  /** 'YYYY-MM-DD'; licences of the media it shows should outlast plannedEnd. */
  @Column({ type: DataType.DATEONLY, allowNull: true })
  plannedStart: string | null;

  @Column({ type: DataType.DATEONLY, allowNull: true })
  plannedEnd: string | null;

  declare id: number;
  declare createdAt: Date;
}
