import { describe, expect, it } from 'vitest';
import { kioskState, kioskStateThresholds } from './index.js';

const now = new Date('2025-06-02T12:00:00.000Z');
const secondsAgo = (s: number) => new Date(now.getTime() - s * 1000);
const thresholds = kioskStateThresholds(30, 300);

describe('kioskState', () => {
  it('is online while the last heartbeat is younger than two intervals', () => {
    expect(thresholds).toEqual({ staleAfterS: 60, offlineAfterS: 300 });
    expect(kioskState(secondsAgo(0), now, thresholds)).toBe('online');
    expect(kioskState(secondsAgo(59.999), now, thresholds)).toBe('online');
  });

  it('turns stale at two intervals of silence and offline at the offline threshold, both ends included', () => {
    expect(kioskState(secondsAgo(60), now, thresholds)).toBe('stale');
    expect(kioskState(secondsAgo(299.999), now, thresholds)).toBe('stale');
    expect(kioskState(secondsAgo(300), now, thresholds)).toBe('offline');
    expect(kioskState(secondsAgo(86_400 * 30), now, thresholds)).toBe('offline');
  });

  it('counts a kiosk that never reported as offline', () => {
    expect(kioskState(null, now, thresholds)).toBe('offline');
  });

  it('reads ISO 8601 text as well as dates', () => {
    expect(kioskState(secondsAgo(90).toISOString(), now, thresholds)).toBe('stale');
  });

  it('keeps offline no sooner than stale when a venue sets a short silence', () => {
    expect(kioskStateThresholds(30, 20)).toEqual({ staleAfterS: 60, offlineAfterS: 60 });
    expect(kioskState(secondsAgo(45), now, kioskStateThresholds(30, 20))).toBe('online');
  });
});
