import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Release } from './release.model.js';

/** A story a release carries, at the revision fixed when the release was asked for. */
@Table({ tableName: 'release_stories', timestamps: false })
export class ReleaseStory extends Model {
  @ForeignKey(() => Release)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  releaseId: number;

  @BelongsTo(() => Release)
  release?: Release;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  storyId: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  revisionId: number;

  /** Order on the kiosk's story menu. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  position: number;

  declare id: number;
}
