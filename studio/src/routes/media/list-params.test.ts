import { describe, expect, it } from 'vitest';
import { readMediaListParams } from './list-params';

describe('Media list parameters in the URL', () => {
  // JSON:API 1.1, "Sorting": a leading minus sorts a field descending.
  it('sorts by size and by licence expiry, either way, as the server does', () => {
    expect(readMediaListParams(new URLSearchParams('sort=bytes')).sort).toBe('bytes');
    expect(readMediaListParams(new URLSearchParams('sort=-licenceExpiresOn&view=table'))).toMatchObject({ sort: '-licenceExpiresOn', view: 'table' });
  });

  it('falls back to the newest first for a sort the server would refuse', () => {
    expect(readMediaListParams(new URLSearchParams('sort=size')).sort).toBe('-createdAt');
    expect(readMediaListParams(new URLSearchParams('')).sort).toBe('-createdAt');
  });
});
