import { PAGE_SIZE } from '@mantlepiece/shared';
import { describe, expect, it } from 'vitest';
import { readListParams } from './list-params';

describe('People list parameters in the URL', () => {
  it('reads page, filters and sort, and ignores values the API would refuse', () => {
    expect(readListParams(new URLSearchParams('page=3&q=%20noor%20&role=translator&active=false&sort=-lastSignInAt'))).toEqual({
      page: 3, pageSize: PAGE_SIZE.fallback, q: 'noor', role: 'translator', active: false, sort: '-lastSignInAt',
    });
    expect(readListParams(new URLSearchParams('page=-2&role=wizard&active=maybe&sort=password'))).toEqual({
      page: 1, pageSize: PAGE_SIZE.fallback, q: undefined, role: undefined, active: undefined, sort: 'name',
    });
  });
});
