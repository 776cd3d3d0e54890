import { describe, expect, it } from 'vitest';
import { insightsFileName, readInsightsFilter } from './range';

describe('readInsightsFilter', () => {
  it('defaults to the first gallery and leaves the days to the server, which counts them on the venue’s clock', () => {
    expect(readInsightsFilter(new URLSearchParams(), 4)).toEqual({ galleryId: 4 });
  });

  it('takes the gallery and days from the URL', () => {
    expect(readInsightsFilter(new URLSearchParams('galleryId=9&to=2025-03-31'), 4)).toEqual({ galleryId: 9, to: '2025-03-31' });
    expect(readInsightsFilter(new URLSearchParams('from=2025-05-10&to=2025-05-12'), 4)).toEqual({ galleryId: 4, from: '2025-05-10', to: '2025-05-12' });
  });

  it('has nothing to ask for before there is a gallery, and ignores malformed dates', () => {
    expect(readInsightsFilter(new URLSearchParams(), undefined)).toBeNull();
    expect(readInsightsFilter(new URLSearchParams('from=yesterday'), 4)).toEqual({ galleryId: 4 });
  });
});

describe('insightsFileName', () => {
  it('names the gallery and the days', () => {
    expect(insightsFileName({ galleryId: 4, from: '2025-05-10', to: '2025-05-12' })).toBe('insights-gallery-4-2025-05-10_to_2025-05-12.csv');
  });
});
