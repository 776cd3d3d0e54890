import { UNIT_STATUSES } from '@mantlepiece/shared';
import type { UnitListParams, WorklistParams } from '../../api/translations';
import { oneOf, pageFrom } from '../../components/lists/list-search';

export const WORKLIST_PAGE_SIZE = 25;
/** A panel has a handful of units; fifty covers several panels, so the keyboard flow rarely turns a page. */
export const UNITS_PAGE_SIZE = 50;

export function readWorklistParams(search: URLSearchParams): WorklistParams {
  return {
    page: pageFrom(search),
    pageSize: WORKLIST_PAGE_SIZE,
    q: search.get('q')?.trim() || undefined,
    locale: search.get('locale')?.trim() || undefined,
  };
}

export function readUnitParams(search: URLSearchParams): UnitListParams {
  return { page: pageFrom(search), pageSize: UNITS_PAGE_SIZE, status: oneOf(search.get('status'), UNIT_STATUSES) };
}
