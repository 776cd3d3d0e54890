import { LONG_PAGE_SIZE } from '@mantlepiece/shared';
import type { AuditFilter } from '../../api/audit';
import { pageFrom, positiveId } from '../../components/lists/list-search';

const isoDate = (value: string | null) => (value && /^\d{4}-\d{2}-\d{2}$/.test(value) ? value : undefined);

export function readAuditFilter(search: URLSearchParams): AuditFilter {
  return {
    actorId: positiveId(search.get('actorId')),
    action: search.get('action')?.trim() || undefined,
    from: isoDate(search.get('from')),
    to: isoDate(search.get('to')),
  };
}

export const readAuditParams = (search: URLSearchParams) => ({ ...readAuditFilter(search), page: pageFrom(search), pageSize: LONG_PAGE_SIZE });

/** The saved file's name says what it holds: the trail, and the dates it covers when filtered. */
export function auditFileName(filter: AuditFilter, today: string): string {
  const span = filter.from || filter.to ? `${filter.from ?? 'start'}_to_${filter.to ?? today}` : today;
  return `audit-trail-${span}.csv`;
}
