import { BeforeBulkUpdate, BeforeUpdate, BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { REVISION_STATES, type PreflightEntry, type RevisionSnapshot, type RevisionState } from '@mantlepiece/shared';
import { jsonColumn } from '../../database/json-column.js';
import { Story } from '../../stories/models/story.model.js';
import { User } from '../../users/models/user.model.js';

/** What a verdict, a withdrawal or a newer submission may change on a revision; its content never changes. */
const MOVABLE = new Set(['state', 'updatedAt']);

function refuseContentChange(changed: readonly string[]): void {
  const fixed = changed.filter((field) => !MOVABLE.has(field));
  if (fixed.length > 0) throw new Error(`A revision is immutable: ${fixed.join(', ')} cannot change once it is submitted`);
}

/** An immutable snapshot of a story as submitted for review, with its preflight. */
@Table({ tableName: 'revisions' })
export class Revision extends Model {
  @ForeignKey(() => Story)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  storyId: number;

  @BelongsTo(() => Story)
  story?: Story;

  /** 1, 2, … within the story. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  number: number;

  /** SHA-256 over the snapshot's canonical JSON. */
  @Column({ type: DataType.CHAR(64), allowNull: false })
  hash: string;

  @Column({ type: DataType.ENUM(...REVISION_STATES), allowNull: false })
  state: RevisionState;

  @Column(jsonColumn('snapshot'))
  snapshot: RevisionSnapshot;

  @Column(jsonColumn('preflight'))
  preflight: PreflightEntry[];

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  blockerCount: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  warningCount: number;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  submittedById: number | null;

  @BelongsTo(() => User)
  submittedBy?: User | null;

  @Column({ type: DataType.DATE(3), allowNull: false })
  submittedAt: Date;

  /** What the curator told the educators when submitting. */
  @Column({ type: DataType.TEXT, allowNull: true })
  note: string | null;

  declare id: number;

  @BeforeUpdate
  static refuseChangedContent(revision: Revision): void {
    refuseContentChange(revision.changed() || []);
  }

  @BeforeBulkUpdate
  static refuseBulkContentChange(options: { attributes?: Record<string, unknown> }): void {
    refuseContentChange(Object.keys(options.attributes ?? {}));
  }
}
