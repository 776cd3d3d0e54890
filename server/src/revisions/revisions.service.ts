import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type FindOptions, type Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import {
  buildRevisionSnapshot, dayIn, diffRevisions, runPreflight,
  type ComparisonBasis, type PreflightEntry, type PreflightMedia, type RevisionComparison, type RevisionSnapshot, type RevisionState, type RevisionSummary, type RevisionView,
} from '@mantlepiece/shared';
import type { Person } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { CommentsService } from '../comments/comments.service.js';
import { Exhibit } from '../exhibits/models/exhibit.model.js';
import { MediaAltText } from '../media/models/media-alt-text.model.js';
import { MediaAsset } from '../media/models/media-asset.model.js';
import { licenceOf } from '../media/media.presenter.js';
import { PanelDocument } from '../panels/models/panel-document.model.js';
import { Panel } from '../panels/models/panel.model.js';
import { Review } from '../reviews/models/review.model.js';
import { toReviewView } from '../reviews/reviews.presenter.js';
import { Story } from '../stories/models/story.model.js';
import { User } from '../users/models/user.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { Revision } from './models/revision.model.js';
import { revisionCan } from './revision-policy.js';
import { toRevisionSummary, toRevisionView } from './revisions.presenter.js';

/** Approvals recorded on the row's revision, as a column of a Revision query. */
export const APPROVALS_COLUMN = Sequelize.literal(
  "(SELECT COUNT(*) FROM `reviews` WHERE `reviews`.`revision_id` = `Revision`.`id` AND `reviews`.`verdict` = 'approve')",
);

const MEDIA_ID = /^[1-9]\d{0,9}$/;

const withSubmitter: FindOptions<Revision> = { include: [{ model: User, attributes: ['id', 'name'] }] };

@Injectable()
export class RevisionsService {
  constructor(
    @InjectModel(Revision) private readonly revisions: typeof Revision,
    @InjectModel(Review) private readonly reviews: typeof Review,
    @InjectModel(Story) private readonly stories: typeof Story,
    @InjectModel(Panel) private readonly panels: typeof Panel,
    @InjectModel(MediaAsset) private readonly media: typeof MediaAsset,
    @InjectModel(Exhibit) private readonly exhibits: typeof Exhibit,
    @InjectModel(Venue) private readonly venues: typeof Venue,
    private readonly comments: CommentsService,
    private readonly clock: Clock,
    private readonly sequelize: Sequelize,
  ) {}

  /** Every panel of the story in every locale, frozen as the shared snapshot. */
  async snapshotOf(story: Story, transaction: Transaction): Promise<RevisionSnapshot> {
    const panels = await this.panels.findAll({ where: { storyId: story.id }, include: [PanelDocument], transaction });
    return buildRevisionSnapshot({
      id: story.id,
      title: story.title,
      audience: story.audience,
      sourceLocale: story.sourceLocale,
      panels: panels.map((panel) => ({
        id: panel.id,
        position: panel.position,
        wordBudget: panel.wordBudget,
        docs: Object.fromEntries((panel.documents ?? []).map((document) => [document.locale, document.doc])),
      })),
    });
  }

  /** The shared checks, given the assets' rights and alt texts, the exhibit's planned end and today's date at the story's venue. */
  async preflightOf(snapshot: RevisionSnapshot, story: Story, transaction: Transaction): Promise<PreflightEntry[]> {
    const ids = snapshot.mediaIds.filter((id) => MEDIA_ID.test(id)).map(Number);
    const assets = await this.media.findAll({ where: { id: ids }, include: [MediaAltText], transaction });
    const media: PreflightMedia[] = assets.map((asset) => ({
      id: asset.id,
      filename: asset.originalFilename,
      credit: asset.credit,
      licence: licenceOf(asset),
      licenceExpiresOn: asset.licenceExpiresOn,
      alt: Object.fromEntries((asset.altTexts ?? []).map((alt) => [alt.locale, alt.text])),
    }));
    const exhibit = story.exhibitId ? await this.exhibits.findByPk(story.exhibitId, { transaction }) : null;
    // A licence runs to the end of its expiry day on the venue's clock, so "today" is the venue's date.
    const today = dayIn(this.clock.now(), (await this.venueOf(story, transaction)).timeZone);
    return runPreflight({ snapshot, media, exhibitPlannedEnd: exhibit?.plannedEnd ?? null, today });
  }

  /**
   * Preflight of the draft as it stands, so the curator sees blockers while writing rather than
   * after submitting. Read in one transaction so panels and media are seen at one moment.
   */
  async draftPreflight(storyId: number): Promise<PreflightEntry[]> {
    return this.sequelize.transaction(async (transaction) => {
      const story = await this.stories.findByPk(storyId, { transaction });
      if (!story) throw new NotFoundException('There is no such story.');
      return this.preflightOf(await this.snapshotOf(story, transaction), story, transaction);
    });
  }

  /** The story's venue, whose settings (approvals needed, languages) its review follows. */
  async venueOf(story: Story, transaction?: Transaction): Promise<Venue> {
    return this.venues.findByPk(story.venueId, { transaction, rejectOnEmpty: true });
  }

  /** Newest first. */
  async listForStory(storyId: number): Promise<RevisionSummary[]> {
    const rows = await this.revisions.findAll({
      ...withSubmitter,
      attributes: { exclude: ['snapshot', 'preflight'], include: [[APPROVALS_COLUMN, 'approvals']] },
      where: { storyId },
      order: [['number', 'DESC']],
    });
    return rows.map(toRevisionSummary);
  }

  async get(id: number, person: Person): Promise<RevisionView> {
    return this.view(await this.find(id), person);
  }

  /**
   * The revision against the story's last approved one before it. While none is approved, against
   * the last one sent back with changes requested: the educator who asked sees what changed in
   * answer, rather than every panel marked new. Every panel is new only on a first review.
   */
  async compare(id: number, person: Person): Promise<RevisionComparison> {
    const revision = await this.find(id);
    const approved = await this.lastApprovedBefore(revision);
    const base = approved ?? (await this.lastBefore(revision, 'changes_requested'));
    const basis: ComparisonBasis = approved ? 'approved' : base ? 'changes_requested' : 'first_review';
    return { basis, base: base && (await this.view(base, person)), diff: diffRevisions(base?.snapshot ?? null, revision.snapshot) };
  }

  private async view(revision: Revision, person: Person): Promise<RevisionView> {
    const [reviews, comments, previous, story] = await Promise.all([
      this.reviews.findAll({ where: { revisionId: revision.id }, include: [{ model: User, attributes: ['id', 'name'] }], order: [['createdAt', 'ASC'], ['id', 'ASC']] }),
      this.comments.listForRevision(revision.id, person),
      this.lastApprovedBefore(revision, ['id']),
      this.stories.findByPk(revision.storyId),
    ]);
    const can = revisionCan(person, {
      state: revision.state,
      storyState: story!.state,
      authorId: revision.submittedById,
      approverIds: reviews.filter((review) => review.verdict === 'approve').map((review) => review.reviewerId),
      requiredApprovals: (await this.venueOf(story!)).requiredApprovals,
      blockers: revision.blockerCount,
    });
    return toRevisionView(revision, { reviews: reviews.map(toReviewView), comments, previousApprovedRevisionId: previous?.id ?? null, can });
  }

  private lastApprovedBefore(revision: Revision, attributes?: string[]): Promise<Revision | null> {
    return this.lastBefore(revision, 'approved', attributes);
  }

  private lastBefore(revision: Revision, state: RevisionState, attributes?: string[]): Promise<Revision | null> {
    return this.revisions.findOne({
      ...withSubmitter,
      ...(attributes ? { attributes } : {}),
      where: { storyId: revision.storyId, state, number: { [Op.lt]: revision.number } },
      order: [['number', 'DESC']],
    });
  }

  private async find(id: number): Promise<Revision> {
    const revision = await this.revisions.findByPk(id, withSubmitter);
    if (!revision) throw new NotFoundException('There is no such revision.');
    return revision;
  }
}
