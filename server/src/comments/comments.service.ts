import { ForbiddenException, Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { carryAnchor, panelText, type CommentView } from '@mantlepiece/shared';
import { personAt, type Member, type Person } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { invalidField } from '../common/validation.js';
import { actingAt, withinReach } from '../common/venue-boundary.js';
import { NotificationsService } from '../notifications/notifications.service.js';
import { Revision } from '../revisions/models/revision.model.js';
import { Story } from '../stories/models/story.model.js';
import { User } from '../users/models/user.model.js';
import { commentCan, COMMENTERS } from './comment-policy.js';
import { toCommentView } from './comments.presenter.js';
import type { CreateCommentDto } from './dto/comment.dto.js';
import { Comment } from './models/comment.model.js';

const people = [
  { model: User, as: 'author', attributes: ['id', 'name'] },
  { model: User, as: 'resolvedBy', attributes: ['id', 'name'] },
];

/** The studio page of a revision, where its comments are read and answered. */
export const reviewPagePath = (revisionId: number) => `/reviews/${revisionId}`;

@Injectable()
export class CommentsService {
  constructor(
    @InjectModel(Comment) private readonly comments: typeof Comment,
    @InjectModel(Revision) private readonly revisions: typeof Revision,
    @InjectModel(User) private readonly users: typeof User,
    private readonly notifications: NotificationsService,
    private readonly clock: Clock,
    private readonly sequelize: Sequelize,
  ) {}

  /** Oldest first, so threads read in order; `person` is the reader at the story's venue. */
  async listForRevision(revisionId: number, person: Person, transaction?: Transaction): Promise<CommentView[]> {
    const rows = await this.comments.findAll({ where: { revisionId }, include: people, order: [['createdAt', 'ASC'], ['id', 'ASC']], transaction });
    return rows.map((comment) => toCommentView(comment, person));
  }

  /** A reply sits on its parent's panel; its parent's author is told. */
  async addComment(revisionId: number, author: User, dto: CreateCommentDto): Promise<CommentView> {
    return this.sequelize.transaction(async (transaction) => {
      const found = await this.revisions.findByPk(revisionId, { include: [{ model: Story, attributes: ['id', 'venueId'] }], transaction });
      const person = actingAt(author, withinReach(author, found?.story, 'There is no such revision.').venueId, COMMENTERS);
      const revision = found!;
      const parent = dto.parentId ? await this.comments.findOne({ where: { id: dto.parentId, revisionId }, transaction }) : null;
      if (dto.parentId && !parent) throw invalidField(['parentId'], 'There is no such comment on this revision to reply to.');
      const panelId = parent ? parent.panelId : (dto.panelId ?? null);
      if (parent && dto.panelId != null && dto.panelId !== parent.panelId) throw invalidField(['panelId'], 'A reply sits on the same panel as the comment it answers.');
      if (panelId !== null && !revision.snapshot.panels.some((panel) => panel.id === panelId)) {
        throw invalidField(['panelId'], `Revision ${revision.number} has no panel ${panelId}.`);
      }
      const range = dto.range ?? null;
      if (range && panelId === null) throw invalidField(['range'], 'A text range needs the panel it is in.');
      if (range && range.from > range.to) throw invalidField(['range', 'to'], 'A range ends where it starts or after.');

      const comment = await this.comments.create({
        revisionId,
        panelId,
        rangeFrom: range?.from ?? null,
        rangeTo: range?.to ?? null,
        rangeQuote: range?.quote ?? null,
        body: dto.body,
        authorId: author.id,
        parentId: parent?.id ?? null,
        carriedFromRevisionId: null,
        anchorChanged: null,
      }, { transaction });
      await this.notifyParentAuthor(parent, author, revision, dto.body, transaction);
      return this.view(comment.id, person, transaction);
    });
  }

  /** Resolves or reopens a comment: its author's, or a reviewer's of the revision, to do. */
  async setResolved(id: number, member: Member, resolved: boolean): Promise<CommentView> {
    return this.sequelize.transaction(async (transaction) => {
      const comment = await this.comments.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
      const revision = comment && (await this.revisions.findByPk(comment.revisionId, { attributes: ['id'], include: [{ model: Story, attributes: ['id', 'venueId'] }], transaction }));
      const person = personAt(member, withinReach(member, revision?.story, 'There is no such comment.').venueId);
      if (!commentCan(person, comment!).resolve) throw new ForbiddenException("Only the comment's author or a reviewer of this revision can resolve or reopen it.");
      await comment!.update(resolved ? { resolvedAt: this.clock.now(), resolvedById: person.id } : { resolvedAt: null, resolvedById: null }, { transaction });
      return this.view(id, person, transaction);
    });
  }

  /**
   * Copies the unresolved comments of `from` onto its successor `to`, wherever their panel is still
   * in the story (story-wide comments always), replies with the thread they belong to. A range
   * follows its quoted words into the new text and says whether they are gone.
   */
  async carryOver(from: Revision, to: Revision, transaction: Transaction): Promise<void> {
    const { sourceLocale } = to.snapshot.story;
    const texts = new Map(to.snapshot.panels.map((panel) => [panel.id, panelText(panel.docs[sourceLocale], { locale: sourceLocale })]));
    const open = await this.comments.findAll({ where: { revisionId: from.id, resolvedAt: null }, order: [['id', 'ASC']], transaction });
    const copies = new Map<number, number>();
    for (const comment of open) {
      if (comment.panelId !== null && !texts.has(comment.panelId)) continue;
      const parentId = comment.parentId === null ? null : copies.get(comment.parentId);
      if (parentId === undefined) continue;
      const anchor = comment.panelId !== null && comment.rangeFrom !== null && comment.rangeTo !== null
        ? carryAnchor({ from: comment.rangeFrom, to: comment.rangeTo, quote: comment.rangeQuote ?? '' }, texts.get(comment.panelId)!)
        : null;
      const copy = await this.comments.create({
        revisionId: to.id,
        panelId: comment.panelId,
        rangeFrom: anchor?.range.from ?? comment.rangeFrom,
        rangeTo: anchor?.range.to ?? comment.rangeTo,
        rangeQuote: comment.rangeQuote,
        anchorChanged: anchor?.changed ?? null,
        body: comment.body,
        authorId: comment.authorId,
        parentId,
        carriedFromRevisionId: from.id,
        createdAt: comment.createdAt,
      }, { transaction });
      copies.set(comment.id, copy.id);
    }
  }

  private async notifyParentAuthor(parent: Comment | null, replier: User, revision: Revision, body: string, transaction: Transaction): Promise<void> {
    if (!parent?.authorId || parent.authorId === replier.id) return;
    const recipient = await this.users.findOne({ where: { id: parent.authorId, active: true }, transaction });
    if (!recipient) return;
    await this.notifications.notify(
      [recipient],
      { kind: 'comment_reply', storyTitle: revision.snapshot.story.title, number: revision.number, replierName: replier.name, body },
      reviewPagePath(revision.id),
      transaction,
    );
  }

  private async view(id: number, person: Person, transaction: Transaction): Promise<CommentView> {
    const comment = await this.comments.findByPk(id, { include: people, transaction });
    return toCommentView(comment!, person);
  }
}
