import { Column, DataType, Model, Table } from 'sequelize-typescript';
import { jsonColumn } from '../../database/json-column.js';

@Table({ tableName: 'venues' })
export class Venue extends Model {
  @Column({ type: DataType.STRING(160), allowNull: false })
  name: string;

  @Column({ type: DataType.STRING(80), allowNull: false, unique: true })
  slug: string;

  /** BCP 47 tag of the language stories are written in. */
  @Column({ type: DataType.STRING(35), allowNull: false })
  sourceLocale: string;

  /** BCP 47 tags the venue's stories are translated into. */
  @Column(jsonColumn('targetLocales'))
  targetLocales: string[];

  /** How many different educators must approve a revision before the story is Approved. */
  @Column({ type: DataType.TINYINT.UNSIGNED, allowNull: false, defaultValue: 1 })
  requiredApprovals: number;

  /** Whether a release may show the source text where a target locale is incomplete or stale. */
  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: false })
  fallbackToSource: boolean;

  /** IANA time zone name (canonical, as Intl resolves it) whose calendar days the venue's dates follow. */
  @Column({ type: DataType.STRING(64), allowNull: false, defaultValue: 'UTC' })
  timeZone: string;

  declare id: number;
  declare createdAt: Date;
}
