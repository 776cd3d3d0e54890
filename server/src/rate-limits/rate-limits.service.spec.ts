import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { RateLimitsService, type RateLimit } from './rate-limits.service.js';
import { TooManyAttemptsException } from './too-many-attempts.exception.js';

let t: TestApp;
let limits: RateLimitsService;

beforeAll(async () => {
  t = await createTestApp();
  limits = t.app.get(RateLimitsService);
});
afterAll(() => t.close());

const MINUTE = 60_000;
const limit = (fields: Partial<RateLimit> = {}): RateLimit => ({ scope: 'spec', subject: randomUUID(), max: 3, windowMs: 15 * MINUTE, ...fields });

/** The wait a refused take names, in seconds, or null when it was allowed. */
async function refusal(...taken: RateLimit[]): Promise<number | null> {
  try {
    await limits.take(taken, 'Too many.');
    return null;
  } catch (error) {
    if (!(error instanceof TooManyAttemptsException)) throw error;
    return error.retryAfterSeconds;
  }
}

describe('RateLimitsService', () => {
  it('allows max takes per window, then refuses until the window has passed, naming the wait', async () => {
    const one = limit();
    for (let i = 0; i < 3; i += 1) expect(await refusal(one)).toBeNull();
    expect(await refusal(one)).toBe(15 * 60);
    t.clock.advance(10 * MINUTE);
    expect(await refusal(one)).toBe(5 * 60);
    t.clock.advance(5 * MINUTE);
    expect(await refusal(one)).toBeNull();
  });

  it('reports the take that uses a limit up, once', async () => {
    const one = limit({ max: 2 });
    expect(await limits.take([one], 'x')).toEqual([]);
    expect(await limits.take([one], 'x')).toEqual([one]);
  });

  it('takes from none when one of several refuses, and a refund gives one back', async () => {
    const wide = limit({ max: 10 });
    const narrow = limit({ max: 1 });
    expect(await refusal(narrow, wide)).toBeNull();
    expect(await refusal(narrow, wide)).toBeGreaterThan(0);
    await limits.refund([narrow]);
    expect(await refusal(narrow, wide)).toBeNull();
    // Two takes reached the wide limit; the refused one gave its take back.
    const [spent] = await limits.take([limit({ subject: wide.subject, max: 3 })], 'x');
    expect(spent?.subject).toBe(wide.subject);
  });

  it('spaces out a slow-down past its allowance, each wait twice the last, up to the cap', async () => {
    const slow = limit({ max: 2, windowMs: 24 * 60 * MINUTE, slowDown: { baseMs: 1000, maxMs: 3000 } });
    expect(await refusal(slow)).toBeNull();
    expect(await refusal(slow)).toBeNull();
    expect(await refusal(slow)).toBe(1);
    t.clock.advance(1000);
    expect(await refusal(slow)).toBeNull();
    t.clock.advance(1000);
    expect(await refusal(slow)).toBe(1);
    t.clock.advance(1000);
    expect(await refusal(slow)).toBeNull();
    t.clock.advance(2999);
    expect(await refusal(slow)).toBe(1);
    t.clock.advance(1);
    expect(await refusal(slow)).toBeNull();
  });

  it('forgets a subject when cleared, and clears every subject with a prefix', async () => {
    const prefix = randomUUID();
    const a = limit({ subject: `${prefix} 192.0.2.1`, max: 1 });
    const b = limit({ subject: `${prefix} 192.0.2.2`, max: 1 });
    const other = limit({ subject: `${prefix}x 192.0.2.3`, max: 1 });
    for (const l of [a, b, other]) await limits.take([l], 'x');
    await limits.clear('spec', { startsWith: `${prefix} ` });
    expect(await refusal(a)).toBeNull();
    expect(await refusal(b)).toBeNull();
    expect(await refusal(other)).toBeGreaterThan(0);
  });
});
