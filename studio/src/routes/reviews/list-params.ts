import { PAGE_SIZE, QUEUE_SORT } from '@mantlepiece/shared';
import type { QueueParams } from '../../api/reviews';
import { pageFrom, sortFrom } from '../../components/lists/list-search';

export function readQueueParams(search: URLSearchParams): QueueParams {
  return {
    page: pageFrom(search),
    pageSize: PAGE_SIZE.fallback,
    q: search.get('q')?.trim() || undefined,
    sort: sortFrom(search, QUEUE_SORT),
  };
}
