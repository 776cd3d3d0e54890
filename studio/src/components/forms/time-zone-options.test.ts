import { describe, expect, it } from 'vitest';
import { searchTimeZones, timeZoneOptions } from './time-zone-options';

const january = new Date('2026-01-15T12:00:00Z');
const july = new Date('2026-07-15T12:00:00Z');

describe('timeZoneOptions', () => {
  it('lists every zone the browser knows with UTC among them, by name', () => {
    const options = timeZoneOptions(january);
    expect(options.map((option) => option.zone)).toContain('UTC');
    expect(options.map((option) => option.zone)).toEqual([...options.map((option) => option.zone)].sort());
  });

  // New Zealand: UTC+12, and +13 in daylight time from late September to early April (New Zealand
  // Daylight Time Order 2007). India: UTC+05:30 all year (Indian Standard Time, no daylight saving).
  it('shows the offset in force at the moment given', () => {
    const offsetOf = (now: Date, zone: string) => timeZoneOptions(now, '', [zone])[0]!.offset;
    expect(offsetOf(january, 'Pacific/Auckland')).toBe('UTC+13:00');
    expect(offsetOf(july, 'Pacific/Auckland')).toBe('UTC+12:00');
    expect(offsetOf(july, 'Asia/Kolkata')).toBe('UTC+05:30');
    expect(offsetOf(july, 'America/St_Johns')).toBe('UTC-02:30');
  });

  it('keeps the current value listed even where this browser does not list it', () => {
    expect(timeZoneOptions(july, 'Asia/Calcutta', ['UTC']).map((option) => option.zone)).toEqual(['Asia/Calcutta', 'UTC']);
  });
});

describe('searchTimeZones', () => {
  const options = timeZoneOptions(july, '', ['America/New_York', 'Asia/Kolkata', 'Pacific/Auckland', 'UTC']);

  it('finds a zone by part of its name, spaces for underscores, case ignored', () => {
    expect(searchTimeZones(options, 'new york').map((option) => option.zone)).toEqual(['America/New_York']);
    expect(searchTimeZones(options, 'AUCK').map((option) => option.zone)).toEqual(['Pacific/Auckland']);
  });

  it('finds a zone by its offset, and everything for an empty search', () => {
    expect(searchTimeZones(options, '+05:30').map((option) => option.zone)).toEqual(['Asia/Kolkata']);
    expect(searchTimeZones(options, '  ')).toHaveLength(4);
  });
});
