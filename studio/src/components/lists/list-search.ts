import { PAGE_SIZE } from '@mantlepiece/shared';

/**
 * What a picker offers (venues, galleries, exhibits, people): the first page at the most rows the
 * server sends, by name. An organisation has a handful of venues and tens of galleries, and the
 * first hundred people by name are every account a venue's staff has.
 */
export const CHOICES_BY_NAME = { page: 1, pageSize: PAGE_SIZE.max, sort: 'name' } as const;

/** A server-paged table keeps its page, sort and filters in the URL, so a view can be bookmarked and shared. */
export function pageFrom(search: URLSearchParams): number {
  const page = Number.parseInt(search.get('page') ?? '1', 10);
  return Number.isFinite(page) && page > 0 ? page : 1;
}

export function oneOf<T extends string>(value: string | null, allowed: readonly T[]): T | undefined {
  return allowed.includes(value as T) ? (value as T) : undefined;
}

/** A list's `?sort=` from the URL when the server sorts by it, else the list's default (`STORY_SORT`, … in shared). */
export function sortFrom<S extends string>(search: URLSearchParams, sort: { values: readonly S[]; fallback: S }): S {
  return oneOf(search.get('sort'), sort.values) ?? sort.fallback;
}

export function positiveId(value: string | null): number | undefined {
  const id = Number(value);
  return Number.isInteger(id) && id > 0 ? id : undefined;
}

/** Applies changes to the URL's parameters; any change other than the page itself starts again at page 1. */
export function withSearchChanges(search: URLSearchParams, changes: Record<string, string | undefined>): URLSearchParams {
  const next = new URLSearchParams(search);
  for (const [key, value] of Object.entries(changes)) {
    if (value === undefined || value === '') next.delete(key);
    else next.set(key, value);
  }
  if (!('page' in changes)) next.delete('page');
  return next;
}

/** Header-cell props for a column the server can sort by: ascending first, a second press descending. */
export function sortableColumn<S extends string>(sort: S, column: string, onSort: (sort: S) => void) {
  const current = sort.replace(/^-/, '');
  const descending = sort.startsWith('-');
  return {
    sortDirection: current === column ? (descending ? 'descending' : 'ascending') : undefined,
    onClick: () => onSort((current === column && !descending ? `-${column}` : column) as S),
  } as const;
}
