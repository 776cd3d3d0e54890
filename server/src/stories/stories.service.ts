import { ConflictException, Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, UniqueConstraintError, type FindOptions, type Transaction, type WhereOptions } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import type { StoryDetailView, StoryPage, StoryView } from '@mantlepiece/shared';
import { inScope, personAt, rolesAnywhere, scopeWhere, venueScope, type Member } from '../auth/policy.js';
import { likePattern, orderOf } from '../common/list-query.js';
import { pageWindow, toPage } from '../common/page.js';
import { invalidField, unknownReference } from '../common/validation.js';
import { actingAt, withinReach } from '../common/venue-boundary.js';
import { Exhibit } from '../exhibits/models/exhibit.model.js';
import { PanelDocument } from '../panels/models/panel-document.model.js';
import { Panel } from '../panels/models/panel.model.js';
import { PanelsService } from '../panels/panels.service.js';
import { User } from '../users/models/user.model.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Venue } from '../venues/models/venue.model.js';
import type { CreateStoryDto, ListStoriesQuery, UpdateStoryDto } from './dto/story.dto.js';
import { Story } from './models/story.model.js';
import { toStoryView } from './stories.presenter.js';
import { NO_SUCH_STORY, refuseUnlessEditable, storiesCan, STORY_WRITERS } from './story-policy.js';
import { venueForNewWork } from '../venues/venue-for-new-work.js';

/** The story's latest approved revision, as `id:number`, so the list reads it without a query per row. */
const APPROVED_REVISION_COLUMN = Sequelize.literal(
  "(SELECT CONCAT(`r`.`id`, ':', `r`.`number`) FROM `revisions` AS `r` WHERE `r`.`story_id` = `Story`.`id` AND `r`.`state` = 'approved' ORDER BY `r`.`number` DESC LIMIT 1)",
);

/** Approvals on the story's open submission, or -1 when none is open. */
const OPEN_APPROVALS_COLUMN = Sequelize.literal(
  "COALESCE((SELECT (SELECT COUNT(*) FROM `reviews` AS `v` WHERE `v`.`revision_id` = `r`.`id` AND `v`.`verdict` = 'approve') " +
  "FROM `revisions` AS `r` WHERE `r`.`story_id` = `Story`.`id` AND `r`.`state` = 'open' ORDER BY `r`.`number` DESC LIMIT 1), -1)",
);

/** What every StoryView needs: the exhibit's name, the author, the number of panels, the approved and the open revision, in one query. */
const storyColumns: FindOptions<Story> = {
  attributes: {
    include: [
      [Sequelize.literal('(SELECT COUNT(*) FROM `panels` WHERE `panels`.`story_id` = `Story`.`id` AND `panels`.`deleted_at` IS NULL)'), 'panelCount'],
      [APPROVED_REVISION_COLUMN, 'approvedRevision'],
      [OPEN_APPROVALS_COLUMN, 'openApprovals'],
    ],
  },
  include: [
    { model: Exhibit, attributes: ['id', 'name'] },
    { model: User, attributes: ['id', 'name'] },
  ],
};

@Injectable()
export class StoriesService {
  constructor(
    @InjectModel(Story) private readonly stories: typeof Story,
    @InjectModel(Exhibit) private readonly exhibits: typeof Exhibit,
    @InjectModel(Venue) private readonly venues: typeof Venue,
    @InjectModel(Panel) private readonly panelRows: typeof Panel,
    @InjectModel(PanelDocument) private readonly documents: typeof PanelDocument,
    private readonly panels: PanelsService,
    private readonly sequelize: Sequelize,
  ) {}

  /** The Stories table of the member's venues (or the one asked for): filtered, sorted and paged by the database. */
  async list(query: ListStoriesQuery, member: Member): Promise<StoryPage> {
    const conditions: WhereOptions<Story>[] = [scopeWhere(venueScope(member))];
    if (query.venueId) conditions.push({ venueId: query.venueId });
    if (query.q) conditions.push({ title: { [Op.like]: likePattern(query.q) } });
    if (query.state) conditions.push({ state: query.state });
    if (query.exhibitId) conditions.push({ exhibitId: query.exhibitId });
    if (query.audience) conditions.push({ audience: query.audience });
    const { rows, count } = await this.stories.findAndCountAll({
      ...storyColumns,
      where: { [Op.and]: conditions },
      order: orderOf(query.sort),
      distinct: true,
      ...pageWindow(query),
    });
    const creator = query.venueId ? personAt(member, query.venueId) : { id: member.id, roles: rolesAnywhere(member) };
    return { ...toPage(rows.map((story) => toStoryView(story, personAt(member, story.venueId))), count, query), can: storiesCan(creator) };
  }

  /** One row of the Stories table, as review moves answer with it. */
  async view(id: number, member: Member): Promise<StoryView> {
    const story = await this.find(id, member);
    return toStoryView(story, personAt(member, story.venueId));
  }

  async get(id: number, member: Member): Promise<StoryDetailView> {
    const story = await this.find(id, member);
    return { ...toStoryView(story, personAt(member, story.venueId)), panels: await this.panels.listForStory(story) };
  }

  /** A story belongs to its exhibit's venue, or to the venue named, and is written in its language unless told otherwise. */
  async createStory(author: User, dto: CreateStoryDto): Promise<StoryView> {
    const exhibit = dto.exhibitId ? await this.findExhibit(dto.exhibitId, author) : null;
    const venue = exhibit?.gallery?.venue ?? (await venueForNewWork(this.venues, author, STORY_WRITERS, dto.venueId));
    if (dto.venueId != null && dto.venueId !== venue.id) throw invalidField(['venueId'], 'The exhibit is at another venue.');
    const story = await this.stories.create({
      title: dto.title,
      audience: dto.audience ?? 'family',
      sourceLocale: dto.sourceLocale ?? venue.sourceLocale,
      venueId: venue.id,
      exhibitId: exhibit?.id ?? null,
      createdById: author.id,
      state: 'draft',
    });
    return this.view(story.id, author);
  }

  /**
   * Changing the source locale relabels the panels' source documents, so the studio keeps editing
   * the same text; it is refused if a translation into that locale already exists.
   */
  async updateStory(id: number, dto: UpdateStoryDto, person: Member): Promise<StoryView> {
    await this.sequelize.transaction(async (transaction) => {
      const story = await this.lock(id, person, transaction);
      refuseUnlessEditable(story);
      if (dto.exhibitId && (await this.findExhibit(dto.exhibitId, person, transaction)).gallery!.venueId !== story.venueId) {
        throw invalidField(['exhibitId'], 'The exhibit is at another venue; a story stays at its venue.');
      }
      if (dto.sourceLocale && dto.sourceLocale !== story.sourceLocale) {
        await this.relabelSourceDocuments(story, dto.sourceLocale, transaction);
      }
      await story.update(dto, { transaction });
    });
    return this.view(id, person);
  }

  /** Once a release has carried the story, kiosks may be playing it: it can be retired, not deleted. */
  async deleteStory(id: number, member: Member): Promise<void> {
    await this.sequelize.transaction(async (transaction) => {
      const story = await this.lock(id, member, transaction);
      if (story.releasedAt) throw new ConflictException('This story has been released, so it cannot be deleted; retire it instead.');
      await story.destroy({ transaction });
    });
  }

  private async find(id: number, member: Member): Promise<Story> {
    return withinReach(member, await this.stories.findByPk(id, storyColumns), NO_SUCH_STORY);
  }

  /** The story locked for a writer: one the member writes at its venue. */
  private async lock(id: number, member: Member, transaction: Transaction): Promise<Story> {
    const story = withinReach(member, await this.stories.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE }), NO_SUCH_STORY);
    actingAt(member, story.venueId, STORY_WRITERS);
    return story;
  }

  /** An exhibit at a venue where the person writes stories; any other answers as if it did not exist. */
  private async findExhibit(id: number, person: Member, transaction?: Transaction): Promise<Exhibit> {
    const exhibit = await this.exhibits.findByPk(id, { include: [{ model: Gallery, include: [Venue] }], transaction });
    if (!exhibit || !inScope(venueScope(person, STORY_WRITERS), exhibit.gallery!.venueId)) throw unknownReference(['exhibitId'], 'There is no such exhibit.');
    return exhibit;
  }

  private async relabelSourceDocuments(story: Story, locale: string, transaction: Transaction): Promise<void> {
    const panelIds = (await this.panelRows.findAll({ where: { storyId: story.id }, attributes: ['id'], transaction })).map((panel) => panel.id);
    try {
      await this.documents.update({ locale }, { where: { panelId: panelIds, locale: story.sourceLocale }, transaction });
    } catch (error) {
      if (error instanceof UniqueConstraintError) throw new ConflictException(`Some panels already have a ${locale} translation; it cannot also be the source.`);
      throw error;
    }
  }
}
