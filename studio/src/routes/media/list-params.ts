import { MEDIA_MISSING_FILTERS, MEDIA_SORT } from '@mantlepiece/shared';
import type { MediaListParams } from '../../api/media';
import { oneOf, pageFrom, sortFrom } from '../../components/lists/list-search';

export const PAGE_SIZE = 24;

/** "Licence expiring" looks this far ahead: a season's notice to renew or replace an image. */
export const EXPIRING_WITHIN_DAYS = 90;

export type MediaFilter = 'missing-alt' | 'missing-credit' | 'expiring';
export const MEDIA_FILTERS: readonly MediaFilter[] = ['missing-alt', 'missing-credit', 'expiring'];

export function readMediaListParams(search: URLSearchParams): MediaListParams & { view: 'grid' | 'table' } {
  const filter = oneOf(search.get('filter'), MEDIA_FILTERS);
  return {
    page: pageFrom(search),
    pageSize: PAGE_SIZE,
    q: search.get('q')?.trim() || undefined,
    missing: filter === 'missing-alt' ? MEDIA_MISSING_FILTERS[0] : filter === 'missing-credit' ? MEDIA_MISSING_FILTERS[1] : undefined,
    expiringWithinDays: filter === 'expiring' ? EXPIRING_WITHIN_DAYS : undefined,
    sort: sortFrom(search, MEDIA_SORT),
    view: search.get('view') === 'table' ? 'table' : 'grid',
  };
}
