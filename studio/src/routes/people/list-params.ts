import { isRole } from '@mantlepiece/shared';
import { USER_SORTS, type UserListParams, type UserSort } from '../../api/users';

export const PAGE_SIZE = 25;

/** The People table's state lives in the URL, so a filtered view can be bookmarked and shared. */
export function readListParams(search: URLSearchParams): UserListParams {
  const page = Number.parseInt(search.get('page') ?? '1', 10);
  const role = search.get('role');
  const active = search.get('active');
  const sort = search.get('sort');
  return {
    page: Number.isFinite(page) && page > 0 ? page : 1,
    pageSize: PAGE_SIZE,
    q: search.get('q')?.trim() || undefined,
    role: isRole(role) ? role : undefined,
    active: active === 'true' ? true : active === 'false' ? false : undefined,
    sort: USER_SORTS.includes(sort as UserSort) ? (sort as UserSort) : 'name',
  };
}

/** Applies changes to the URL's parameters; any filter change starts again at page 1. */
export type ListChanges = Partial<Record<'q' | 'role' | 'active' | 'sort' | 'page' | 'invite', string | undefined>>;

export function withListChanges(search: URLSearchParams, changes: ListChanges): URLSearchParams {
  const next = new URLSearchParams(search);
  for (const [key, value] of Object.entries(changes)) {
    if (value === undefined || value === '') next.delete(key);
    else next.set(key, value);
  }
  if (!('page' in changes)) next.delete('page');
  return next;
}
