/** A server-paged table keeps its page, sort and filters in the URL, so a view can be bookmarked and shared. */
export function pageFrom(search: URLSearchParams): number {
  const page = Number.parseInt(search.get('page') ?? '1', 10);
  return Number.isFinite(page) && page > 0 ? page : 1;
}

export function oneOf<T extends string>(value: string | null, allowed: readonly T[]): T | undefined {
  return allowed.includes(value as T) ? (value as T) : undefined;
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
