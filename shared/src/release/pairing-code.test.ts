import { describe, expect, it } from 'vitest';
import { looksLikePairingCode, normalisePairingCode } from './pairing-code.js';

describe('a pairing code as a technician types it', () => {
  it('ignores case, spaces and dashes', () => {
    expect(normalisePairingCode(' k7m-q2p ')).toBe('K7MQ2P');
    expect(looksLikePairingCode('k7m q2p')).toBe(true);
  });

  it('refuses characters a kiosk never shows and codes of the wrong length', () => {
    expect(looksLikePairingCode('K7MQ20')).toBe(false);
    expect(looksLikePairingCode('K7MQIP')).toBe(false);
    expect(looksLikePairingCode('K7MQ2')).toBe(false);
    expect(looksLikePairingCode('K7MQ2PP')).toBe(false);
  });
});
