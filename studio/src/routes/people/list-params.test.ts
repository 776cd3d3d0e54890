import { describe, expect, it } from 'vitest';
import { readListParams, withListChanges } from './list-params';

describe('People list parameters in the URL', () => {
  it('reads page, filters and sort, and ignores values the API would refuse', () => {
    expect(readListParams(new URLSearchParams('page=3&q=%20noor%20&role=translator&active=false&sort=-lastSignInAt'))).toEqual({
      page: 3, pageSize: 25, q: 'noor', role: 'translator', active: false, sort: '-lastSignInAt',
    });
    expect(readListParams(new URLSearchParams('page=-2&role=wizard&active=maybe&sort=password'))).toEqual({
      page: 1, pageSize: 25, q: undefined, role: undefined, active: undefined, sort: 'name',
    });
  });

  it('goes back to page 1 when a filter changes, but not when only the page does', () => {
    const search = new URLSearchParams('page=4&role=curator');
    expect(withListChanges(search, { q: 'reyes' }).toString()).toBe('role=curator&q=reyes');
    expect(withListChanges(search, { page: '5' }).get('page')).toBe('5');
    expect(withListChanges(search, { role: undefined }).has('role')).toBe(false);
  });
});
