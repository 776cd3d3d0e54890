import { describe, expect, it } from 'vitest';
import { LONG_PAGE_SIZE, MEDIA_SORT, PAGE_SIZE, QUEUE_SORT, SETTINGS_SORT, STORY_SORT, USER_SORT } from './list-queries.js';

describe('list queries', () => {
  // JSON:API 1.1, "Sorting": a sort field is ascending, and descending with a leading minus sign.
  it.each([['stories', STORY_SORT], ['media', MEDIA_SORT], ['review queue', QUEUE_SORT], ['people', USER_SORT], ['settings', SETTINGS_SORT]] as const)(
    'offers each %s key ascending and descending (leading minus), and sorts by one of them by default',
    (_list, sort) => {
      expect([...sort.values].sort()).toEqual(sort.keys.flatMap((key) => [key, `-${key}`]).sort());
      expect(sort.values).toContain(sort.fallback);
    },
  );

  it('sorts media by size and by licence expiry too, as the server does', () => {
    expect(MEDIA_SORT.values).toEqual(expect.arrayContaining(['bytes', '-bytes', 'licenceExpiresOn', '-licenceExpiresOn']));
  });

  it('pages by a default no larger than the most a page holds', () => {
    expect(PAGE_SIZE.fallback).toBeGreaterThan(0);
    expect(PAGE_SIZE.fallback).toBeLessThanOrEqual(PAGE_SIZE.max);
  });

  it('pages the long lists by more than the default, yet no more than a page holds, so the server accepts it', () => {
    expect(LONG_PAGE_SIZE).toBeGreaterThan(PAGE_SIZE.fallback);
    expect(LONG_PAGE_SIZE).toBeLessThanOrEqual(PAGE_SIZE.max);
  });
});
