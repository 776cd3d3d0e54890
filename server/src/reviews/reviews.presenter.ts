import type { ReviewView } from '@mantlepiece/shared';
import { personRef } from '../revisions/revisions.presenter.js';
import type { Review } from './models/review.model.js';

/** `review` with its reviewer. */
export const toReviewView = (review: Review): ReviewView => ({
  id: review.id,
  verdict: review.verdict,
  note: review.note,
  reviewer: personRef(review.reviewer),
  createdAt: review.createdAt.toISOString(),
});
