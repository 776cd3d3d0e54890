import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Gallery } from '../../venues/models/gallery.model.js';
import { Release } from './release.model.js';

export const PUBLICATION_KINDS = ['publish', 'rollback'] as const;
export type PublicationKind = (typeof PUBLICATION_KINDS)[number];

/** One publish or rollback of a gallery, numbered by `sequence`, with the signed record kiosks receive. */
@Table({ tableName: 'publications' })
export class Publication extends Model {
  @ForeignKey(() => Gallery)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  galleryId: number;

  /** 1, 2, 3 … within the gallery; only ever grows. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  sequence: number;

  @ForeignKey(() => Release)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  releaseId: number;

  @BelongsTo(() => Release)
  release?: Release;

  @Column({ type: DataType.ENUM(...PUBLICATION_KINDS), allowNull: false })
  kind: PublicationKind;

  @Column({ type: DataType.DATE(3), allowNull: false })
  publishedAt: Date;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  publishedById: number | null;

  /** The record as signed (canonical JSON); null until first signed. */
  @Column({ type: DataType.TEXT, allowNull: true })
  record: string | null;

  @Column({ type: DataType.STRING(120), allowNull: true })
  signature: string | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  expiresAt: Date | null;

  declare id: number;
  declare createdAt: Date;
  declare updatedAt: Date;
}
