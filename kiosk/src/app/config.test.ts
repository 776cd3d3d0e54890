import { describe, expect, it } from 'vitest';
import { DEFAULT_CONFIG, readKioskConfig } from './config';

describe('kiosk timings', () => {
  it('reads seconds from the launch URL and ignores what is not a positive number', () => {
    expect(readKioskConfig('?idle=120&heartbeat=15&attract=-3&poll=x')).toEqual({ ...DEFAULT_CONFIG, idleMs: 120_000, heartbeatMs: 15_000 });
  });

  it('reads the venue an unpaired screen shows from the install URL', () => {
    expect(readKioskConfig('?venue=basalt-point&idle=60')).toEqual({ ...DEFAULT_CONFIG, idleMs: 60_000, venueSlug: 'basalt-point' });
    expect(readKioskConfig('?venue=').venueSlug).toBeNull();
  });

  // WCAG 2.2, success criterion 2.2.1 Timing Adjustable: a warning of at least 20 seconds.
  it('never gives a visitor less than 20 s to answer the idle warning', () => {
    expect(readKioskConfig('?warning=5').warningMs).toBe(20_000);
  });
});
