import type { CommentView } from '@mantlepiece/shared';
import type { Person } from '../auth/policy.js';
import { personRef } from '../revisions/revisions.presenter.js';
import { commentCan } from './comment-policy.js';
import type { Comment } from './models/comment.model.js';

/** `comment` with its author and resolver, and what `person` may do to it. */
export const toCommentView = (comment: Comment, person: Person): CommentView => ({
  id: comment.id,
  revisionId: comment.revisionId,
  panelId: comment.panelId,
  range: comment.rangeFrom === null || comment.rangeTo === null ? null : { from: comment.rangeFrom, to: comment.rangeTo, quote: comment.rangeQuote ?? '' },
  body: comment.body,
  author: personRef(comment.author),
  parentId: comment.parentId,
  resolvedAt: comment.resolvedAt?.toISOString() ?? null,
  resolvedBy: personRef(comment.resolvedBy),
  createdAt: comment.createdAt.toISOString(),
  carriedFromRevisionId: comment.carriedFromRevisionId,
  anchorChanged: comment.anchorChanged ?? null,
  can: commentCan(person, comment),
});
