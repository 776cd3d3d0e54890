import { describe, expect, it } from 'vitest';
import { formatBytes, licenceExpiresWithin } from './media-facts';

describe('media facts', () => {
  it('counts a licence expiring in 90 days or already expired as expiring, and one without an end date as not', () => {
    expect(licenceExpiresWithin({ licenceExpiresOn: '2026-03-31' }, 90, '2026-01-01')).toBe(true);
    expect(licenceExpiresWithin({ licenceExpiresOn: '2026-04-02' }, 90, '2026-01-01')).toBe(false);
    expect(licenceExpiresWithin({ licenceExpiresOn: '2025-06-01' }, 90, '2026-01-01')).toBe(true);
    expect(licenceExpiresWithin({ licenceExpiresOn: null }, 90, '2026-01-01')).toBe(false);
  });

  it('writes file sizes in SI units (1 kB = 1000 bytes)', () => {
    expect(formatBytes(512, 'en')).toBe('512 byte');
    expect(formatBytes(25_000_000, 'en')).toBe('25 MB');
  });
});
