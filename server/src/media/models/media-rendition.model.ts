import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { MediaAsset } from './media-asset.model.js';

/** A WebP of an asset at one width, metadata stripped. */
@Table({ tableName: 'media_renditions' })
export class MediaRendition extends Model {
  @ForeignKey(() => MediaAsset)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  mediaAssetId: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  width: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  height: number;

  /** Of the rendition's own bytes, for release bundles to check. */
  @Column({ type: DataType.CHAR(64), allowNull: false })
  sha256: string;

  @Column({ type: DataType.STRING(200), allowNull: false })
  storeKey: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  bytes: number;

  declare id: number;
}
