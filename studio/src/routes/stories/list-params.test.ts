import { PAGE_SIZE } from '@mantlepiece/shared';
import { describe, expect, it } from 'vitest';
import { withSearchChanges } from '../../components/lists/list-search';
import { readStoryListParams } from './list-params';

describe('the Stories table state in the URL', () => {
  it('reads filters, page and sort, newest changes first by default', () => {
    const params = readStoryListParams(new URLSearchParams('q=ridge&state=draft&exhibitId=3&audience=family&page=2'));
    expect(params).toEqual({ page: 2, pageSize: PAGE_SIZE.fallback, q: 'ridge', state: 'draft', exhibitId: 3, audience: 'family', sort: '-updatedAt' });
  });

  it('ignores values the API would refuse rather than sending them', () => {
    const params = readStoryListParams(new URLSearchParams('state=published&exhibitId=abc&audience=kids&sort=colour&page=-1'));
    expect(params).toEqual({ page: 1, pageSize: PAGE_SIZE.fallback, q: undefined, state: undefined, exhibitId: undefined, audience: undefined, sort: '-updatedAt' });
  });

  it('goes back to page 1 when a filter changes, but not when the page does', () => {
    const search = new URLSearchParams('page=4&state=draft');
    expect(withSearchChanges(search, { audience: 'adult' }).toString()).toBe('state=draft&audience=adult');
    expect(withSearchChanges(search, { page: '5' }).toString()).toBe('page=5&state=draft');
  });
});
