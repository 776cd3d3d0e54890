import { isRole, PAGE_SIZE, USER_SORT } from '@mantlepiece/shared';
import type { UserListParams } from '../../api/users';
import { pageFrom, sortFrom } from '../../components/lists/list-search';

/** The People table's state lives in the URL, so a filtered view can be bookmarked and shared. */
export function readListParams(search: URLSearchParams): UserListParams {
  const role = search.get('role');
  const active = search.get('active');
  return {
    page: pageFrom(search),
    pageSize: PAGE_SIZE.fallback,
    q: search.get('q')?.trim() || undefined,
    role: isRole(role) ? role : undefined,
    active: active === 'true' ? true : active === 'false' ? false : undefined,
    sort: sortFrom(search, USER_SORT),
  };
}
