import { LONG_PAGE_SIZE, PAGE_SIZE, UNIT_STATUSES } from '@mantlepiece/shared';
import type { UnitListParams, WorklistParams } from '../../api/translations';
import { oneOf, pageFrom } from '../../components/lists/list-search';

export function readWorklistParams(search: URLSearchParams): WorklistParams {
  return {
    page: pageFrom(search),
    pageSize: PAGE_SIZE.fallback,
    q: search.get('q')?.trim() || undefined,
    locale: search.get('locale')?.trim() || undefined,
  };
}

/** A panel has a handful of units; a long page covers several panels, so the keyboard flow rarely turns a page. */
export function readUnitParams(search: URLSearchParams): UnitListParams {
  return { page: pageFrom(search), pageSize: LONG_PAGE_SIZE, status: oneOf(search.get('status'), UNIT_STATUSES) };
}
