import { QUEUE_SORT } from '@mantlepiece/shared';
import type { QueueParams } from '../../api/reviews';
import { pageFrom, sortFrom } from '../../components/lists/list-search';

export const PAGE_SIZE = 25;

export function readQueueParams(search: URLSearchParams): QueueParams {
  return {
    page: pageFrom(search),
    pageSize: PAGE_SIZE,
    q: search.get('q')?.trim() || undefined,
    sort: sortFrom(search, QUEUE_SORT),
  };
}
