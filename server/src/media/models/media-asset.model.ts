import { Column, DataType, ForeignKey, HasMany, Model, Table } from 'sequelize-typescript';
import { RENDITION_STATES, type RenditionState } from '@mantlepiece/shared';
import { Venue } from '../../venues/models/venue.model.js';
import { MediaAltText } from './media-alt-text.model.js';
import { MediaRendition } from './media-rendition.model.js';

export const LICENCE_KINDS = ['spdx', 'all-rights-reserved'] as const;
export type LicenceKind = (typeof LICENCE_KINDS)[number];

/**
 * An uploaded image of one venue, once per content (sha256) there, with its rights and alt text.
 * Paranoid: a deleted image keeps its row and files, restorable, until the deleted-items job purges
 * it; queries leave it out.
 */
@Table({ tableName: 'media_assets', paranoid: true })
export class MediaAsset extends Model {
  @ForeignKey(() => Venue)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  venueId: number;

  /** Unique per venue; two venues' assets of the same bytes share one stored file. */
  @Column({ type: DataType.CHAR(64), allowNull: false })
  sha256: string;

  @Column({ type: DataType.STRING(255), allowNull: false })
  originalFilename: string;

  /** As detected from the bytes, never as the client said. */
  @Column({ type: DataType.STRING(40), allowNull: false })
  mime: string;

  /** After auto-orientation: what a visitor sees. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  width: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  height: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  bytes: number;

  /** data: URI of a tiny blurred WebP. */
  @Column({ type: DataType.TEXT, allowNull: false })
  placeholder: string;

  @Column({ type: DataType.STRING(500), allowNull: true })
  credit: string | null;

  @Column({ type: DataType.ENUM(...LICENCE_KINDS), allowNull: true })
  licenceKind: LicenceKind | null;

  @Column({ type: DataType.STRING(100), allowNull: true })
  licenceSpdxId: string | null;

  @Column({ type: DataType.STRING(200), allowNull: true })
  licenceHolder: string | null;

  @Column({ type: DataType.DATEONLY, allowNull: true })
  licenceExpiresOn: string | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  uploadedById: number | null;

  /** Whether its WebP renditions are made yet: pending until the renditions worker has made them. */
  @Column({ type: DataType.ENUM(...RENDITION_STATES), allowNull: false, defaultValue: 'pending' })
  renditionState: RenditionState;

  /** 0 to 1 while pending. */
  @Column({ type: DataType.DOUBLE, allowNull: false, defaultValue: 0 })
  renditionProgress: number;

  /** Why making the renditions failed, for the person who retries. */
  @Column({ type: DataType.STRING(1000), allowNull: true })
  renditionFailure: string | null;

  /** The instance making its renditions, until when (see ClaimQueue). */
  @Column({ type: DataType.STRING(100), allowNull: true })
  claimedBy: string | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  claimExpiresAt: Date | null;

  @HasMany(() => MediaRendition)
  renditions?: MediaRendition[];

  @HasMany(() => MediaAltText)
  altTexts?: MediaAltText[];

  declare id: number;
  declare createdAt: Date;
  declare deletedAt: Date | null;
}
