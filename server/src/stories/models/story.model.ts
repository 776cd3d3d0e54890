import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { AUDIENCES, STORY_STATES, type Audience, type StoryState } from '@mantlepiece/shared';
import { Exhibit } from '../../exhibits/models/exhibit.model.js';
import { User } from '../../users/models/user.model.js';
import { Venue } from '../../venues/models/venue.model.js';

@Table({ tableName: 'stories' })
export class Story extends Model {
  @Column({ type: DataType.STRING(200), allowNull: false })
  title: string;

  @Column({ type: DataType.ENUM(...AUDIENCES), allowNull: false })
  audience: Audience;

  /** BCP 47 tag of the language the panels are written in. */
  @Column({ type: DataType.STRING(35), allowNull: false })
  sourceLocale: string;

  @Column({ type: DataType.ENUM(...STORY_STATES), allowNull: false, defaultValue: 'draft' })
  state: StoryState;

  /** The venue the story belongs to: its exhibit's, when it has one. */
  @ForeignKey(() => Venue)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  venueId: number;

  @BelongsTo(() => Venue)
  venue?: Venue;

  @ForeignKey(() => Exhibit)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  exhibitId: number | null;

  @BelongsTo(() => Exhibit)
  exhibit?: Exhibit | null;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  createdById: number | null;

  @BelongsTo(() => User)
  createdBy?: User | null;

  /** Set by the first release that carries the story; a released story is never deleted. */
  @Column({ type: DataType.DATE(3), allowNull: true })
  releasedAt: Date | null;

  declare id: number;
  declare createdAt: Date;
  declare updatedAt: Date;
}
