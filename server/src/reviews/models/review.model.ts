import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { VERDICTS, type Verdict } from '@mantlepiece/shared';
import { BeforeAnyChange } from '../../database/append-only.js';
import { Revision } from '../../revisions/models/revision.model.js';
import { User } from '../../users/models/user.model.js';

/** One educator's verdict on one revision. Part of the approval trail, so never changed or removed. */
@Table({ tableName: 'reviews', updatedAt: false })
export class Review extends Model {
  @ForeignKey(() => Revision)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  revisionId: number;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  reviewerId: number | null;

  @BelongsTo(() => User)
  reviewer?: User | null;

  @Column({ type: DataType.ENUM(...VERDICTS), allowNull: false })
  verdict: Verdict;

  @Column({ type: DataType.TEXT, allowNull: true })
  note: string | null;

  @Column({ type: DataType.DATE(3), allowNull: false })
  declare createdAt: Date;

  declare id: number;

  @BeforeAnyChange
  static refuseChange(): never {
    throw new Error('Verdicts are append-only');
  }
}
