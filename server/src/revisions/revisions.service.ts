import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type FindOptions, type Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import {
  buildRevisionSnapshot, dayIn, diffRevisions, runPreflight,
  type ComparisonBasis, type PreflightEntry, type PreflightMedia, type RevisionComparison, type RevisionSnapshot, type RevisionState, type RevisionSummary, type RevisionView,
} from '@mantlepiece/shared';
import { personAt, type Member } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { CommentsService } from '../comments/comments.service.js';
import { withinReach } from '../common/venue-boundary.js';
import { Exhibit } from '../exhibits/models/exhibit.model.js';
import { MediaAltText } from '../media/models/media-alt-text.model.js';
import { MediaAsset } from '../media/models/media-asset.model.js';
import { licenceOf } from '../media/media.presenter.js';
import { PanelDocument } from '../panels/models/panel-document.model.js';
import { Panel } from '../panels/models/panel.model.js';
import { Review } from '../reviews/models/review.model.js';
import { toReviewView } from '../reviews/reviews.presenter.js';
import { Story } from '../stories/models/story.model.js';
import { NO_SUCH_STORY } from '../stories/story-policy.js';
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
const NO_SUCH_REVISION = 'There is no such revision.';

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
  async draftPreflight(storyId: number, member: Member): Promise<PreflightEntry[]> {
    return this.sequelize.transaction(async (transaction) => {
      const story = withinReach(member, await this.stories.findByPk(storyId, { transaction }), NO_SUCH_STORY);
      return this.preflightOf(await this.snapshotOf(story, transaction), story, transaction);
    });
  }

  /** The story's venue, whose settings (approvals needed, languages) its review follows. */
  async venueOf(story: Story, transaction?: Transaction): Promise<Venue> {
    return this.venues.findByPk(story.venueId, { transaction, rejectOnEmpty: true });
  }

  /** Newest first. */
  async listForStory(storyId: number, member: Member): Promise<RevisionSummary[]> {
    withinReach(member, await this.stories.findByPk(storyId, { attributes: ['id', 'venueId'] }), NO_SUCH_STORY);
    const rows = await this.revisions.findAll({
      ...withSubmitter,
      attributes: { exclude: ['snapshot', 'preflight'], include: [[APPROVALS_COLUMN, 'approvals']] },
      where: { storyId },
      order: [['number', 'DESC']],
    });
    return rows.map(toRevisionSummary);
  }

  async get(id: number, member: Member): Promise<RevisionView> {
    return this.view(await this.find(id, member), member);
  }

  /**
   * The revision against the story's last approved one before it. While none is approved, against
   * the last one sent back with changes requested: the educator who asked sees what changed in
   * answer, rather than every panel marked new. Every panel is new only on a first review.
   */
  async compare(id: number, member: Member): Promise<RevisionComparison> {
    const revision = await this.find(id, member);
    const approved = await this.lastApprovedBefore(revision);
    const base = approved ?? (await this.lastBefore(revision, 'changes_requested'));
    const basis: ComparisonBasis = approved ? 'approved' : base ? 'changes_requested' : 'first_review';
    return { basis, base: base && (await this.view(base, member)), diff: diffRevisions(base?.snapshot ?? null, revision.snapshot) };
  }

  /** The revision as `member` sees it, deciding at its story's venue. */
  private async view(revision: Revision, member: Member): Promise<RevisionView> {
    const story = (await this.stories.findByPk(revision.storyId))!;
    const person = personAt(member, story.venueId);
    const [reviews, comments, previous] = await Promise.all([
      this.reviews.findAll({ where: { revisionId: revision.id }, include: [{ model: User, attributes: ['id', 'name'] }], order: [['createdAt', 'ASC'], ['id', 'ASC']] }),
      this.comments.listForRevision(revision.id, person),
      this.lastApprovedBefore(revision, ['id']),
    ]);
    const can = revisionCan(person, {
      state: revision.state,
      storyState: story.state,
      authorId: revision.submittedById,
      approverIds: reviews.filter((review) => review.verdict === 'approve').map((review) => review.reviewerId),
      requiredApprovals: (await this.venueOf(story)).requiredApprovals,
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

  /** A revision of a story the member may reach; another venue's answers as a missing one. */
  private async find(id: number, member: Member): Promise<Revision> {
    const revision = await this.revisions.findByPk(id, { include: [{ model: User, attributes: ['id', 'name'] }, { model: Story, attributes: ['id', 'venueId'] }] });
    withinReach(member, revision?.story, NO_SUCH_REVISION);
    return revision!;
  }
}
