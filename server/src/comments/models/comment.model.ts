import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Revision } from '../../revisions/models/revision.model.js';
import { User } from '../../users/models/user.model.js';

/** A note on a revision, anchored to a panel and, where text was selected, to that range. */
@Table({ tableName: 'comments' })
export class Comment extends Model {
  @ForeignKey(() => Revision)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  revisionId: number;

  /** The panel's id in the revision's snapshot; null for the story as a whole. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  panelId: number | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  rangeFrom: number | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  rangeTo: number | null;

  @Column({ type: DataType.STRING(1000), allowNull: true })
  rangeQuote: string | null;

  @Column({ type: DataType.TEXT, allowNull: false })
  body: string;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  authorId: number | null;

  @BelongsTo(() => User, 'authorId')
  author?: User | null;

  @ForeignKey(() => Comment)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  parentId: number | null;

  @Column({ type: DataType.DATE(3), allowNull: true })
  resolvedAt: Date | null;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  resolvedById: number | null;

  @BelongsTo(() => User, 'resolvedById')
  resolvedBy?: User | null;

  @ForeignKey(() => Revision)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  carriedFromRevisionId: number | null;

  /** On a carried comment with a range: whether its quoted words are gone from this revision's panel. */
  @Column({ type: DataType.BOOLEAN, allowNull: true })
  anchorChanged: boolean | null;

  declare id: number;
  declare createdAt: Date;
}
