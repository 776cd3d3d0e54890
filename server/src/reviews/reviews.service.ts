import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type Order, type OrderItem, type Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import {
  decide, preflightBlockers, revisionHash, STORY_STATE_LABELS, STORY_WORKFLOW,
  type Page, type ReviewQueueItem, type RevisionState, type StoryState, type StoryView, type SubmitRequest, type SubmitResult, type VerdictResult, type WorkflowRequest,
} from '@mantlepiece/shared';
import { AuditService } from '../audit/audit.service.js';
import { personAt, scopeWhere, venueScope, type Member, type Person } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { CommentsService, reviewPagePath } from '../comments/comments.service.js';
import { likePattern } from '../common/list-query.js';
import { pageWindow, toPage } from '../common/page.js';
import { withinReach } from '../common/venue-boundary.js';
import { NotificationsService } from '../notifications/notifications.service.js';
import { Revision } from '../revisions/models/revision.model.js';
import { personRef } from '../revisions/revisions.presenter.js';
import { APPROVALS_COLUMN, RevisionsService } from '../revisions/revisions.service.js';
import { Story } from '../stories/models/story.model.js';
import { StoriesService } from '../stories/stories.service.js';
import { NO_SUCH_STORY } from '../stories/story-policy.js';
import { User } from '../users/models/user.model.js';
import { UsersService } from '../users/users.service.js';
import type { RecordVerdictDto, ReviewQueueQuery } from './dto/review.dto.js';
import { Review } from './models/review.model.js';
import { toReviewView } from './reviews.presenter.js';
import { blockedByPreflight, workflowRefusal } from './workflow-refusal.js';

/** The approvals a row's revision needs: its story's venue's setting. */
const REQUIRED_APPROVALS_COLUMN = Sequelize.literal('(SELECT `v`.`required_approvals` FROM `venues` AS `v` WHERE `v`.`id` = `story`.`venue_id`)');

const NO_SUCH_REVISION = 'There is no such revision.';

const REVISION_STATE_WORDS: Readonly<Record<RevisionState, string>> = {
  open: 'open', approved: 'approved', changes_requested: 'closed with changes requested', superseded: 'superseded by a newer submission', withdrawn: 'withdrawn by its curator',
};

@Injectable()
export class ReviewsService {
  constructor(
    @InjectModel(Revision) private readonly revisionRows: typeof Revision,
    @InjectModel(Review) private readonly reviews: typeof Review,
    @InjectModel(Story) private readonly stories: typeof Story,
    @InjectModel(User) private readonly users: typeof User,
    private readonly revisions: RevisionsService,
    private readonly storyViews: StoriesService,
    private readonly people: UsersService,
    private readonly comments: CommentsService,
    private readonly notifications: NotificationsService,
    private readonly audit: AuditService,
    private readonly clock: Clock,
    private readonly sequelize: Sequelize,
  ) {}

  /**
   * Freezes the story as a new revision with its preflight and the curator's note, supersedes the
   * open one, carries the unresolved comments forward and tells the educators. Refused while
   * preflight finds blockers, so educators only see work that could be approved; warnings go
   * along with the revision.
   */
  async submitForReview(storyId: number, curator: User, request: SubmitRequest = {}): Promise<SubmitResult> {
    return this.sequelize.transaction(async (transaction) => {
      const story = await this.lockStory(storyId, curator, NO_SUCH_STORY, transaction);
      const state = this.allow({ state: story.state, action: 'submit', actor: personAt(curator, story.venueId), revision: null });
      const snapshot = await this.revisions.snapshotOf(story, transaction);
      if (snapshot.panels.length === 0) throw new ConflictException('This story has no panels yet; add one before submitting it for review.');
      const preflight = await this.revisions.preflightOf(snapshot, story, transaction);
      const blockers = preflightBlockers(preflight);
      if (blockers.length > 0) throw blockedByPreflight(blockers, 'submission');

      const previous = await this.revisionRows.findOne({ where: { storyId }, order: [['number', 'DESC']], transaction });
      if (previous?.state === 'open') await previous.update({ state: 'superseded' }, { transaction });
      const revision = await this.revisionRows.create({
        storyId,
        number: (previous?.number ?? 0) + 1,
        hash: await revisionHash(snapshot),
        state: 'open',
        snapshot,
        preflight,
        blockerCount: blockers.length,
        warningCount: preflight.filter((entry) => entry.severity === 'warning' && !entry.passed).length,
        submittedById: curator.id,
        submittedAt: this.clock.now(),
        note: request.note?.trim() || null,
      }, { transaction });
      if (previous) await this.comments.carryOver(previous, revision, transaction);
      await story.update({ state }, { transaction });

      await this.audit.record({
        actorId: curator.id, action: 'revision.submitted', targetType: 'revision', targetId: revision.id,
        detail: { storyId, number: revision.number, hash: revision.hash, blockers: revision.blockerCount, supersededRevisionId: previous?.state === 'superseded' ? previous.id : null },
      }, transaction);
      await this.notifications.notify(
        await this.educatorsOtherThan(curator, story.venueId, transaction),
        { kind: 'revision_submitted', storyTitle: story.title, number: revision.number, submitterName: curator.name },
        reviewPagePath(revision.id),
        transaction,
      );
      return { revisionId: revision.id, number: revision.number, state, preflight };
    });
  }

  /** An educator's verdict on the open revision; an approval counts only while preflight has no blockers. */
  async recordVerdict(revisionId: number, educator: User, dto: RecordVerdictDto): Promise<VerdictResult> {
    return this.sequelize.transaction(async (transaction) => {
      const found = await this.revisionRows.findByPk(revisionId, { attributes: ['storyId'], transaction });
      if (!found) throw new NotFoundException(NO_SUCH_REVISION);
      const story = await this.lockStory(found.storyId, educator, NO_SUCH_REVISION, transaction);
      const revision = (await this.revisionRows.findByPk(revisionId, { transaction }))!;
      if (revision.state !== 'open') {
        throw new ConflictException(`Revision ${revision.number} is ${REVISION_STATE_WORDS[revision.state]}; only a story's open revision takes verdicts. This story is ${STORY_STATE_LABELS[story.state]}.`);
      }
      const approvals = await this.reviews.findAll({ where: { revisionId, verdict: 'approve' }, attributes: ['reviewerId'], transaction });
      const venue = await this.revisions.venueOf(story, transaction);
      const note = dto.note?.trim() || null;
      const state = this.allow({
        state: story.state,
        action: dto.verdict,
        actor: personAt(educator, story.venueId),
        // A deleted account is nobody: 0 matches no person's id.
        revision: { authorId: revision.submittedById ?? 0, approvals: approvals.map((approval) => ({ educatorId: approval.reviewerId ?? 0 })) },
        requiredApprovals: venue.requiredApprovals,
        note,
      });
      if (dto.verdict === 'approve') {
        const blockers = preflightBlockers(revision.preflight);
        if (blockers.length > 0) throw blockedByPreflight(blockers, 'approval');
      }

      const review = await this.reviews.create({ revisionId, reviewerId: educator.id, verdict: dto.verdict, note, createdAt: this.clock.now() }, { transaction });
      if (state !== story.state) {
        await revision.update({ state: dto.verdict === 'approve' ? 'approved' : 'changes_requested' }, { transaction });
        await story.update({ state }, { transaction });
      }
      await this.audit.record({
        actorId: educator.id, action: dto.verdict === 'approve' ? 'revision.approved' : 'revision.changes-requested', targetType: 'revision', targetId: revisionId,
        detail: { storyId: story.id, number: revision.number, storyState: state, ...(note ? { note } : {}) },
      }, transaction);
      await this.notifyAuthor(revision, story, educator, { verdict: dto.verdict, note, storyState: state }, transaction);
      review.reviewer = educator;
      return { review: toReviewView(review), storyState: state };
    });
  }

  /**
   * Takes an open submission back to Draft before any educator has given a verdict on it; the
   * revision stays in the story's history as withdrawn, and leaves the review queue.
   */
  async withdrawSubmission(storyId: number, curator: User): Promise<StoryView> {
    await this.sequelize.transaction(async (transaction) => {
      const story = await this.lockStory(storyId, curator, NO_SUCH_STORY, transaction);
      const open = await this.revisionRows.findOne({ where: { storyId, state: 'open' }, transaction });
      const approvals = open ? await this.reviews.findAll({ where: { revisionId: open.id, verdict: 'approve' }, attributes: ['reviewerId'], transaction }) : [];
      const state = this.allow({
        state: story.state,
        action: 'withdraw',
        actor: personAt(curator, story.venueId),
        revision: open && { authorId: open.submittedById ?? 0, approvals: approvals.map((approval) => ({ educatorId: approval.reviewerId ?? 0 })) },
      });
      await open!.update({ state: 'withdrawn' }, { transaction });
      await story.update({ state }, { transaction });
      await this.audit.record({ actorId: curator.id, action: 'revision.withdrawn', targetType: 'revision', targetId: open!.id, detail: { storyId, number: open!.number } }, transaction);
    });
    return this.storyViews.view(storyId, curator);
  }

  /**
   * Opens a new draft of an approved story, from its latest revision (the editor was closed since
   * it was submitted). The approved revision stays what releases carry until a newer one is approved.
   */
  async reviseStory(storyId: number, curator: User): Promise<StoryView> {
    await this.sequelize.transaction(async (transaction) => {
      const story = await this.lockStory(storyId, curator, NO_SUCH_STORY, transaction);
      const state = this.allow({ state: story.state, action: 'revise', actor: personAt(curator, story.venueId), revision: null });
      const approved = await this.revisionRows.findOne({ where: { storyId, state: 'approved' }, order: [['number', 'DESC']], attributes: ['id', 'number'], transaction });
      await story.update({ state }, { transaction });
      await this.audit.record({
        actorId: curator.id, action: 'story.revised', targetType: 'story', targetId: storyId,
        detail: { approvedRevisionId: approved?.id ?? null, approvedNumber: approved?.number ?? null },
      }, transaction);
    });
    return this.storyViews.view(storyId, curator);
  }

  /** Takes an approved story out of future releases; bringing it back means a new review. */
  async retireStory(storyId: number, actor: User): Promise<StoryView> {
    await this.sequelize.transaction(async (transaction) => {
      const story = await this.lockStory(storyId, actor, NO_SUCH_STORY, transaction);
      const state = this.allow({ state: story.state, action: 'retire', actor: personAt(actor, story.venueId), revision: null });
      await story.update({ state }, { transaction });
      await this.audit.record({ actorId: actor.id, action: 'story.retired', targetType: 'story', targetId: storyId }, transaction);
    });
    return this.storyViews.view(storyId, actor);
  }

  /** Open revisions waiting for verdicts at the venues where the educator reviews, searched by story title, paged by the database. */
  async queue(query: ReviewQueueQuery, educator: Member): Promise<Page<ReviewQueueItem>> {
    const { rows, count } = await this.revisionRows.findAndCountAll({
      attributes: { exclude: ['snapshot', 'preflight'], include: [[APPROVALS_COLUMN, 'approvals'], [REQUIRED_APPROVALS_COLUMN, 'requiredApprovals']] },
      include: [{ model: Story, attributes: ['id', 'title', 'exhibitId'] }, { model: User, attributes: ['id', 'name'] }],
      where: {
        state: 'open',
        ...scopeWhere(venueScope(educator, STORY_WORKFLOW.approve.roles), '$story.venue_id$'),
        ...(query.venueId ? { '$story.venue_id$': query.venueId } : {}),
        ...(query.q ? { '$story.title$': { [Op.like]: likePattern(query.q) } } : {}),
      },
      order: queueOrder(query.sort),
      ...pageWindow(query),
    });
    return toPage(rows.map(toQueueItem), count, query);
  }

  /** Runs the shared workflow rule; a refusal becomes the contract's status code. */
  private allow(request: WorkflowRequest): StoryState {
    const decision = decide(request);
    if (!decision.ok) throw workflowRefusal(decision.reason, decision.message);
    return decision.next;
  }

  /** The story, locked, if the member may reach its venue; `missing` is what an unreachable one answers. */
  private async lockStory(id: number, member: Member, missing: string, transaction: Transaction): Promise<Story> {
    return withinReach(member, await this.stories.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE }), missing);
  }

  /** The educators of the story's venue, who review its submissions. */
  private async educatorsOtherThan(person: Person, venueId: number, transaction: Transaction): Promise<User[]> {
    const educators = await this.people.holdingAt(venueId, 'educator', transaction);
    return educators.filter((educator) => educator.id !== person.id);
  }

  private async notifyAuthor(
    revision: Revision, story: Story, reviewer: User,
    verdict: { verdict: RecordVerdictDto['verdict']; note: string | null; storyState: StoryState },
    transaction: Transaction,
  ): Promise<void> {
    const author = revision.submittedById ? await this.users.findOne({ where: { id: revision.submittedById, active: true }, transaction }) : null;
    if (!author) return;
    await this.notifications.notify(
      [author],
      { kind: 'verdict', storyTitle: story.title, number: revision.number, reviewerName: reviewer.name, ...verdict },
      reviewPagePath(revision.id),
      transaction,
    );
  }
}

function queueOrder(sort: string): Order {
  const descending = sort.startsWith('-');
  const direction = descending ? 'DESC' : 'ASC';
  const key = descending ? sort.slice(1) : sort;
  const first: OrderItem = key === 'storyTitle' ? [Sequelize.col('story.title'), direction] : [key === 'blockers' ? 'blockerCount' : 'submittedAt', direction];
  return [first, ['id', 'ASC']];
}

/** `revision` as read by `queue`, with its story, submitter and count columns. */
const toQueueItem = (revision: Revision): ReviewQueueItem => ({
  revisionId: revision.id,
  storyId: revision.storyId,
  storyTitle: revision.story!.title,
  number: revision.number,
  submittedAt: revision.submittedAt.toISOString(),
  submittedBy: personRef(revision.submittedBy),
  blockers: revision.blockerCount,
  warnings: revision.warningCount,
  approvals: Number(revision.get('approvals') ?? 0),
  requiredApprovals: Number(revision.get('requiredApprovals') ?? 1),
});
