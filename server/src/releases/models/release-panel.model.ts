import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Release } from './release.model.js';

/** A panel a release carries, from its story's revision: what a kiosk's visitor events may name. */
@Table({ tableName: 'release_panels', timestamps: false })
export class ReleasePanel extends Model {
  @ForeignKey(() => Release)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  releaseId: number;

  @BelongsTo(() => Release)
  release?: Release;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  storyId: number;

  /** The revision snapshot's panel id. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  panelId: number;

  declare id: number;
}
