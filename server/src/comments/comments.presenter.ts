import type { CommentView } from '@mantlepiece/shared';
import { personRef } from '../revisions/revisions.presenter.js';
import type { Comment } from './models/comment.model.js';

/** `comment` with its author and resolver. */
export const toCommentView = (comment: Comment): CommentView => ({
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
});
