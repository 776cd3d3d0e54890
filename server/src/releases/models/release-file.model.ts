import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Release } from './release.model.js';

/** A file a release lists; the bytes live once per hash in the store, however many releases list them. */
@Table({ tableName: 'release_files', timestamps: false })
export class ReleaseFile extends Model {
  @ForeignKey(() => Release)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  releaseId: number;

  @BelongsTo(() => Release)
  release?: Release;

  @Column({ type: DataType.CHAR(64), allowNull: false })
  sha256: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  size: number;

  @Column({ type: DataType.STRING(80), allowNull: false })
  mime: string;

  declare id: number;
}
