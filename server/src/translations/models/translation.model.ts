import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { MediaAsset } from '../../media/models/media-asset.model.js';
import { Panel } from '../../panels/models/panel.model.js';
import { Story } from '../../stories/models/story.model.js';
import { User } from '../../users/models/user.model.js';

/**
 * A translator's text for one translation unit in one locale. Units are not stored: they are cut
 * from the current source on demand, and `sourceHash` says which source this text was made from.
 */
@Table({ tableName: 'translations' })
export class Translation extends Model {
  /** The shared core's unit id: `p42.paragraph.3`, `p42.widget.ridge.caption`, `m17.alt`. */
  @Column({ type: DataType.STRING(191), allowNull: false })
  unitId: string;

  /** BCP 47, canonical form. */
  @Column({ type: DataType.STRING(35), allowNull: false })
  locale: string;

  /** Set for a panel's units; null for an alt text, which belongs to the image. */
  @ForeignKey(() => Story)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  storyId: number | null;

  @ForeignKey(() => Panel)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  panelId: number | null;

  @ForeignKey(() => MediaAsset)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  mediaAssetId: number | null;

  /** The display form: `Le {1}roc{/1} monte de {2} cm par an`. */
  @Column({ type: DataType.TEXT, allowNull: false })
  text: string;

  @Column({ type: DataType.CHAR(64), allowNull: false })
  sourceHash: string;

  /** The source in display form when this was translated; shown beside the new one once stale. */
  @Column({ type: DataType.TEXT, allowNull: false })
  sourceText: string;

  /** The version of the panel's source document it was made from; null for alt text. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  sourceVersion: number | null;

  /** Compare-and-set token of the translator's saves. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 })
  override version: number;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  translatorId: number | null;

  @BelongsTo(() => User)
  translator?: User | null;

  @Column({ type: DataType.CHAR(64), allowNull: true })
  staleNotifiedHash: string | null;

  declare id: number;
  declare updatedAt: Date;
}
