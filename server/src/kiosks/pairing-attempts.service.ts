import { Injectable } from '@nestjs/common';
import { ConfigService } from '../config/config.service.js';
import { RateLimitsService, type RateLimit } from '../rate-limits/rate-limits.service.js';

export const PAIRING_WINDOW_MINUTES = 15;
export const PAIRING_MAX_FAILURES_PER_STATION = 5;
export const PAIRING_MAX_FAILURES_PER_ADDRESS = 20;
const WINDOW_MS = PAIRING_WINDOW_MINUTES * 60_000;

/**
 * The limits on pairing, counted by the shared rate limits: codes a client address may ask for,
 * and codes tried per station and per client address. A code is six characters from 29, so a
 * handful of tries per quarter hour leaves guessing hopeless.
 */
@Injectable()
export class PairingAttemptsService {
  constructor(
    private readonly limits: RateLimitsService,
    private readonly config: ConfigService,
  ) {}

  /** One new pairing code for this address, or 429: each start stores a row. */
  async takeStart(clientAddress: string): Promise<void> {
    await this.limits.take(
      [{ scope: 'pairing-start:address', subject: clientAddress, max: this.config.pairingStartsPerAddress, windowMs: WINDOW_MS }],
      'Too many pairing codes asked for from this address.',
    );
  }

  /** One code check, taken before the code is looked up, or 429. */
  async takeCheck(stationId: number, clientAddress: string): Promise<RateLimit[]> {
    const limits = this.checkLimits(stationId, clientAddress);
    await this.limits.take(limits, 'Too many wrong pairing codes.');
    return limits;
  }

  /** The right code: only wrong ones count. */
  async checkSucceeded(limits: RateLimit[]): Promise<void> {
    await this.limits.refund(limits);
  }

  private checkLimits(stationId: number, clientAddress: string): RateLimit[] {
    return [
      { scope: 'pairing-code:station', subject: String(stationId), max: PAIRING_MAX_FAILURES_PER_STATION, windowMs: WINDOW_MS },
      { scope: 'pairing-code:address', subject: clientAddress, max: PAIRING_MAX_FAILURES_PER_ADDRESS, windowMs: WINDOW_MS },
    ];
  }
}
