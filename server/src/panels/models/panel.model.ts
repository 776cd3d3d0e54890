import { BelongsTo, Column, DataType, ForeignKey, HasMany, Model, Table } from 'sequelize-typescript';
import { Story } from '../../stories/models/story.model.js';
import { PanelDocument } from './panel-document.model.js';

/**
 * One screen of a story. Its text lives in PanelDocument, one per locale. Paranoid: a deleted panel
 * keeps its row and position, restorable, until the deleted-items job purges it; queries leave it out.
 */
@Table({ tableName: 'panels', paranoid: true })
export class Panel extends Model {
  @ForeignKey(() => Story)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  storyId: number;

  @BelongsTo(() => Story)
  story?: Story;

  /** 0-based place in the story. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  position: number;

  /** Words that fit one screen at the kiosk's type size. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  wordBudget: number;

  @HasMany(() => PanelDocument)
  documents?: PanelDocument[];

  declare id: number;
  declare updatedAt: Date;
  declare deletedAt: Date | null;
}
