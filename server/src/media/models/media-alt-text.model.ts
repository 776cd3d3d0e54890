import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { MediaAsset } from './media-asset.model.js';

@Table({ tableName: 'media_alt_texts' })
export class MediaAltText extends Model {
  @ForeignKey(() => MediaAsset)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  mediaAssetId: number;

  /** BCP 47. */
  @Column({ type: DataType.STRING(35), allowNull: false })
  locale: string;

  @Column({ type: DataType.STRING(1000), allowNull: false })
  text: string;

  declare id: number;
}
