import { describe, expect, it } from 'vitest';
import { insightsFileName, readInsightsFilter } from './range';

const today = new Date('2025-06-02T15:00:00Z');

describe('readInsightsFilter', () => {
  it('defaults to the first gallery and the 30 days up to today', () => {
    expect(readInsightsFilter(new URLSearchParams(), today, 4)).toEqual({ galleryId: 4, from: '2025-05-04', to: '2025-06-02' });
  });

  it('takes the gallery and days from the URL, counting 30 days back from a chosen end', () => {
    expect(readInsightsFilter(new URLSearchParams('galleryId=9&to=2025-03-31'), today, 4)).toEqual({ galleryId: 9, from: '2025-03-02', to: '2025-03-31' });
    expect(readInsightsFilter(new URLSearchParams('from=2025-05-10&to=2025-05-12'), today, 4)).toEqual({ galleryId: 4, from: '2025-05-10', to: '2025-05-12' });
  });

  it('has nothing to ask for before there is a gallery, and ignores malformed dates', () => {
    expect(readInsightsFilter(new URLSearchParams(), today, undefined)).toBeNull();
    expect(readInsightsFilter(new URLSearchParams('from=yesterday'), today, 4)?.from).toBe('2025-05-04');
  });
});

describe('insightsFileName', () => {
  it('names the gallery and the days', () => {
    expect(insightsFileName({ galleryId: 4, from: '2025-05-10', to: '2025-05-12' })).toBe('insights-gallery-4-2025-05-10_to_2025-05-12.csv');
  });
});
