import { describe, expect, it } from 'vitest';
import { durationText, relativeTime } from './relative-time';

const now = new Date('2025-06-02T12:00:00Z');
const ago = (s: number) => new Date(now.getTime() - s * 1000).toISOString();

describe('relativeTime', () => {
  it('uses the largest whole unit, rounded down', () => {
    expect(relativeTime(ago(12), now, 'en')).toBe('12 seconds ago');
    expect(relativeTime(ago(119), now, 'en')).toBe('1 minute ago');
    expect(relativeTime(ago(3 * 3600 + 59 * 60), now, 'en')).toBe('3 hours ago');
    expect(relativeTime(ago(3 * 86_400), now, 'en')).toBe('3 days ago');
  });

  it('says "now" for this second and for a clock slightly ahead of ours', () => {
    expect(relativeTime(ago(0), now, 'en')).toBe('now');
    expect(relativeTime(ago(-5), now, 'en')).toBe('now');
  });

  it('writes the studio language', () => {
    expect(relativeTime(ago(120), now, 'fr')).toBe('il y a 2 minutes');
  });
});

describe('durationText', () => {
  it('shows two units at most', () => {
    expect(durationText(40)).toBe('40 s');
    expect(durationText(5 * 60 + 3)).toBe('5 min');
    expect(durationText(5 * 3600 + 12 * 60 + 9)).toBe('5 h 12 min');
    expect(durationText(2 * 86_400 + 4 * 3600 + 60)).toBe('2 d 4 h');
  });
});
