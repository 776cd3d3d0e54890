import fc from 'fast-check';
import moment from 'moment-timezone';
import { describe, expect, it } from 'vitest';
import { addDays, canonicalTimeZone, dayEndIn, dayIn, dayStartIn, formatOffset, isoInZone, offsetMinutesAt } from './venue-day.js';

const HOUR_MS = 3_600_000;
const hoursIn = (day: string, zone: string) => (dayEndIn(day, zone).getTime() - dayStartIn(day, zone).getTime()) / HOUR_MS;
const at = (iso: string) => new Date(iso);

describe('canonicalTimeZone', () => {
  it('gives the name Intl resolves, in its canonical spelling', () => {
    expect(canonicalTimeZone('Pacific/Auckland')).toBe('Pacific/Auckland');
    expect(canonicalTimeZone('europe/london')).toBe('Europe/London');
    expect(canonicalTimeZone('utc')).toBe('UTC');
  });

  it('refuses what is no zone name: unknown names, offsets, empty text', () => {
    expect(canonicalTimeZone('Mars/Olympus_Mons')).toBeNull();
    expect(canonicalTimeZone('+05:00')).toBeNull();
    expect(canonicalTimeZone('')).toBeNull();
    expect(canonicalTimeZone('Europe/London; DROP TABLE venues')).toBeNull();
  });
});

// Daylight-saving dates below are the published rules, worked out for 2026:
// - UK (and EU) summer time: from the last Sunday of March to the last Sunday of October, changing
//   at 01:00 UTC (Summer Time Act 1972 with the Summer Time Order 2002; EU Directive 2000/84/EC).
//   2026: 29 March and 25 October.
// - New Zealand daylight time: from the last Sunday of September at 02:00 NZST to the first Sunday
//   of April at 03:00 NZDT (New Zealand Daylight Time Order 2007). 2026: ends 5 April, starts 27 September.
// - Chile: clocks go forward at 04:00 UTC on the first Sunday of September from the 2nd, so local
//   midnight is skipped (tzdb `southamerica`, Rule Chile 2023 max; from memory, and checked below
//   against moment-timezone's own copy of the tz database).
// - Kiribati's Line Islands have kept UTC+14 since the date line moved east of them at the end of
//   1994; Samoa skipped Friday 30 December 2011 going from UTC−10 to UTC+14 (tzdb `australasia`).
describe('dayIn', () => {
  it('gives the local date far from UTC: UTC+14 is already tomorrow from 10:00 UTC', () => {
    expect(dayIn(at('2026-12-02T09:59:59Z'), 'Pacific/Kiritimati')).toBe('2026-12-02');
    expect(dayIn(at('2026-12-02T10:00:00Z'), 'Pacific/Kiritimati')).toBe('2026-12-03');
    expect(dayIn(at('2026-12-02T10:00:00Z'), 'Pacific/Pago_Pago')).toBe('2026-12-01');
  });

  it('turns over at local midnight on both sides of a change', () => {
    expect(dayIn(at('2026-03-28T23:59:59Z'), 'Europe/London')).toBe('2026-03-28');
    expect(dayIn(at('2026-03-29T23:00:00Z'), 'Europe/London')).toBe('2026-03-30');
    expect(dayIn(at('2026-04-04T10:59:59Z'), 'Pacific/Auckland')).toBe('2026-04-04');
    expect(dayIn(at('2026-04-04T11:00:00Z'), 'Pacific/Auckland')).toBe('2026-04-05');
  });
});

describe('dayStartIn and dayEndIn', () => {
  it('give 24-hour days away from any change', () => {
    expect(dayStartIn('2026-12-03', 'Pacific/Kiritimati')).toEqual(at('2026-12-02T10:00:00Z'));
    expect(dayEndIn('2026-12-03', 'Pacific/Kiritimati')).toEqual(at('2026-12-03T10:00:00Z'));
    expect(dayStartIn('2026-07-01', 'UTC')).toEqual(at('2026-07-01T00:00:00Z'));
  });

  it('give London 23 hours on 29 March 2026 and 25 on 25 October 2026', () => {
    expect(dayStartIn('2026-03-29', 'Europe/London')).toEqual(at('2026-03-29T00:00:00Z'));
    expect(dayEndIn('2026-03-29', 'Europe/London')).toEqual(at('2026-03-29T23:00:00Z'));
    expect(hoursIn('2026-03-29', 'Europe/London')).toBe(23);
    expect(dayStartIn('2026-10-25', 'Europe/London')).toEqual(at('2026-10-24T23:00:00Z'));
    expect(hoursIn('2026-10-25', 'Europe/London')).toBe(25);
  });

  it('give Auckland 25 hours on 5 April 2026 and 23 on 27 September 2026', () => {
    expect(dayStartIn('2026-04-05', 'Pacific/Auckland')).toEqual(at('2026-04-04T11:00:00Z'));
    expect(dayEndIn('2026-04-05', 'Pacific/Auckland')).toEqual(at('2026-04-05T12:00:00Z'));
    expect(hoursIn('2026-04-05', 'Pacific/Auckland')).toBe(25);
    expect(dayStartIn('2026-09-27', 'Pacific/Auckland')).toEqual(at('2026-09-26T12:00:00Z'));
    expect(hoursIn('2026-09-27', 'Pacific/Auckland')).toBe(23);
  });

  it('start a day whose midnight is skipped at the first moment it has (01:00 in Santiago)', () => {
    expect(dayStartIn('2026-09-06', 'America/Santiago')).toEqual(at('2026-09-06T04:00:00Z'));
    expect(hoursIn('2026-09-06', 'America/Santiago')).toBe(23);
  });

  it('give a skipped day no length: Samoa had no 30 December 2011', () => {
    expect(dayStartIn('2011-12-30', 'Pacific/Apia')).toEqual(dayStartIn('2011-12-31', 'Pacific/Apia'));
    expect(hoursIn('2011-12-30', 'Pacific/Apia')).toBe(0);
    expect(hoursIn('2011-12-29', 'Pacific/Apia')).toBe(24);
  });

  it('refuse a day not written YYYY-MM-DD', () => {
    expect(() => dayStartIn('2/3/2026', 'UTC')).toThrow(RangeError);
  });
});

describe('offsets', () => {
  it('write ISO 8601 offsets, half hours and west of UTC too', () => {
    expect(formatOffset(840)).toBe('+14:00');
    expect(formatOffset(-210)).toBe('-03:30');
    expect(formatOffset(0)).toBe('+00:00');
    expect(offsetMinutesAt(at('2026-01-15T12:00:00Z'), 'Asia/Kolkata')).toBe(330);
  });

  it('write an instant with the offset in force then', () => {
    expect(isoInZone(at('2026-03-29T00:59:59Z'), 'Europe/London')).toBe('2026-03-29T00:59:59+00:00');
    expect(isoInZone(at('2026-03-29T01:00:00Z'), 'Europe/London')).toBe('2026-03-29T02:00:00+01:00');
  });

  it('adds days by the calendar, across months and leap days', () => {
    expect(addDays('2028-02-28', 1)).toBe('2028-02-29');
    expect(addDays('2026-03-01', -1)).toBe('2026-02-28');
    expect(addDays('2026-12-31', 1)).toBe('2027-01-01');
  });
});

// The reference: moment-timezone reads its own packed copy of the tz database, not the ICU data Intl uses.
describe('against moment-timezone', () => {
  const zones = ['UTC', 'Europe/London', 'Pacific/Auckland', 'Pacific/Kiritimati', 'Pacific/Chatham', 'America/Santiago', 'America/New_York', 'Australia/Lord_Howe', 'Asia/Kathmandu', 'Africa/Casablanca'];
  const instants = fc.date({ min: at('2025-01-01T00:00:00Z'), max: at('2027-12-31T00:00:00Z'), noInvalidDate: true });

  it('agrees on the local date and ISO 8601 form of any instant in 2025–2027', () => {
    fc.assert(
      fc.property(instants, fc.constantFrom(...zones), (instant, zone) => {
        const reference = moment.tz(instant.getTime(), zone);
        expect(dayIn(instant, zone)).toBe(reference.format('YYYY-MM-DD'));
        expect(isoInZone(instant, zone)).toBe(reference.format('YYYY-MM-DDTHH:mm:ssZ'));
      }),
      { numRuns: 500 },
    );
  }, 60_000);

  it('agrees on where each day starts, every day of 2026 in every zone', () => {
    for (const zone of zones) {
      for (let day = '2026-01-01'; day < '2027-01-01'; day = addDays(day, 1)) {
        expect(dayStartIn(day, zone).getTime(), `${day} in ${zone}`).toBe(moment.tz(day, zone).startOf('day').valueOf());
      }
    }
  }, 60_000); // 3,650 days: well under a second alone, longer on a machine busy with a test stack
});
