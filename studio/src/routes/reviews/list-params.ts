import { QUEUE_SORTS, type QueueParams } from '../../api/reviews';
import { oneOf, pageFrom } from '../../components/lists/list-search';

export const PAGE_SIZE = 25;

/** Oldest submission first: the one that has waited longest is the next to check. */
export const DEFAULT_QUEUE_SORT = 'submittedAt';

export function readQueueParams(search: URLSearchParams): QueueParams {
  return {
    page: pageFrom(search),
    pageSize: PAGE_SIZE,
    q: search.get('q')?.trim() || undefined,
    sort: oneOf(search.get('sort'), QUEUE_SORTS) ?? DEFAULT_QUEUE_SORT,
  };
}
