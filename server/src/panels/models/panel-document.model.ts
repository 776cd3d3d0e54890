import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { PanelDocJSON } from '@mantlepiece/shared';
import { jsonColumn } from '../../database/json-column.js';
import { Panel } from './panel.model.js';

/** A panel's Tiptap document in one locale; `version` is the compare-and-set token of its saves. */
@Table({ tableName: 'panel_documents' })
export class PanelDocument extends Model {
  @ForeignKey(() => Panel)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  panelId: number;

  @Column({ type: DataType.STRING(35), allowNull: false })
  locale: string;

  @Column(jsonColumn('doc'))
  doc: PanelDocJSON;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 })
  override version: number;

  declare id: number;
  declare updatedAt: Date;
}
