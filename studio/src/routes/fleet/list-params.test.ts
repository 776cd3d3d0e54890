import { LONG_PAGE_SIZE } from '@mantlepiece/shared';
import { describe, expect, it } from 'vitest';
import { byGallery, readFleetParams } from './list-params';

describe('fleet list params', () => {
  it('reads the page and the gallery filter from the URL, ignoring nonsense', () => {
    expect(readFleetParams(new URLSearchParams('page=3&galleryId=7'))).toEqual({ page: 3, pageSize: LONG_PAGE_SIZE, galleryId: 7, access: 'active' });
    expect(readFleetParams(new URLSearchParams('page=-1&galleryId=x'))).toEqual({ page: 1, pageSize: LONG_PAGE_SIZE, galleryId: undefined, access: 'active' });
  });

  it('shows the active kiosks unless asked for the revoked ones or all', () => {
    expect(readFleetParams(new URLSearchParams('access=revoked')).access).toBe('revoked');
    expect(readFleetParams(new URLSearchParams('access=all')).access).toBeUndefined();
    expect(readFleetParams(new URLSearchParams('access=paused')).access).toBe('active');
  });
});

describe('byGallery', () => {
  it('starts a group wherever the gallery changes, keeping the server order', () => {
    const hall = { id: 1, name: 'Moving Plates Hall' };
    const deep = { id: 2, name: 'Deep Time Gallery' };
    const rows = [{ id: 10, gallery: hall }, { id: 11, gallery: hall }, { id: 12, gallery: deep }];
    expect(byGallery(rows)).toEqual([
      { gallery: hall, kiosks: [rows[0], rows[1]] },
      { gallery: deep, kiosks: [rows[2]] },
    ]);
    expect(byGallery([])).toEqual([]);
  });
});
