import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { MediaAsset } from '../../media/models/media-asset.model.js';
import { Panel } from './panel.model.js';

/** "Panel shows asset", rewritten from the document on each save so "where is it used" is a query. */
@Table({ tableName: 'panel_media_usages', timestamps: false })
export class PanelMediaUsage extends Model {
  @ForeignKey(() => Panel)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, primaryKey: true })
  panelId: number;

  @BelongsTo(() => Panel)
  panel?: Panel;

  @ForeignKey(() => MediaAsset)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, primaryKey: true })
  mediaAssetId: number;

  @BelongsTo(() => MediaAsset)
  mediaAsset?: MediaAsset;
}
