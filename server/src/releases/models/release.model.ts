import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Gallery } from '../../venues/models/gallery.model.js';

export const RELEASE_STATES = ['building', 'ready', 'live', 'superseded', 'failed'] as const;
export type ReleaseState = (typeof RELEASE_STATES)[number];

/** A signed, content-addressed bundle of approved revisions for one gallery. */
@Table({ tableName: 'releases' })
export class Release extends Model {
  @ForeignKey(() => Gallery)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  galleryId: number;

  @BelongsTo(() => Gallery)
  gallery?: Gallery;

  /** 1, 2, 3 … within the gallery. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  number: number;

  @Column({ type: DataType.ENUM(...RELEASE_STATES), allowNull: false })
  state: ReleaseState;

  /** 0 to 1 while building. */
  @Column({ type: DataType.DOUBLE, allowNull: false, defaultValue: 0 })
  progress: number;

  @Column({ type: DataType.STRING(120), allowNull: false })
  phase: string;

  @Column({ type: DataType.STRING(1000), allowNull: true })
  failure: string | null;

  /** The instance building it, until when (see ClaimQueue); a claim that ran out fails the build. */
  @Column({ type: DataType.STRING(100), allowNull: true })
  claimedBy: string | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  claimExpiresAt: Date | null;

  /** The manifest JSON exactly as signed. */
  @Column({ type: DataType.TEXT('long'), allowNull: true })
  manifest: string | null;

  @Column({ type: DataType.STRING(120), allowNull: true })
  signature: string | null;

  /** Of the manifest's bytes: the ETag kiosks revalidate with. */
  @Column({ type: DataType.CHAR(64), allowNull: true })
  manifestSha256: string | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 })
  fileCount: number;

  @Column({ type: DataType.BIGINT.UNSIGNED, allowNull: false, defaultValue: 0 })
  bytes: number;

  /** The gallery id while Live, else null (one Live release per gallery, held by a unique key). */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  liveGalleryId: number | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  createdById: number | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  readyAt: Date | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  publishedAt: Date | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  publishedById: number | null;

  declare id: number;
  declare createdAt: Date;
  declare updatedAt: Date;
}
