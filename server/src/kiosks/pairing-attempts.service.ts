import { HttpException, HttpStatus, Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import { Clock } from '../clock/clock.service.js';
import { PairingFailure } from './models/pairing-failure.model.js';

export const PAIRING_WINDOW_MINUTES = 15;
export const PAIRING_MAX_FAILURES_PER_STATION = 5;
export const PAIRING_MAX_FAILURES_PER_ADDRESS = 20;

/**
 * Counts wrong pairing codes per station and per client address in the database, as sign-in
 * failures are counted, so the limit holds across server instances. A code is six characters
 * from 29, so a handful of tries per quarter hour leaves guessing hopeless.
 */
@Injectable()
export class PairingAttemptsService {
  constructor(
    @InjectModel(PairingFailure) private readonly failures: typeof PairingFailure,
    private readonly clock: Clock,
  ) {}

  async assertAllowed(stationId: number, clientAddress: string): Promise<void> {
    const [forStation, forAddress] = await this.countRecent(stationId, clientAddress);
    if (forStation >= PAIRING_MAX_FAILURES_PER_STATION || forAddress >= PAIRING_MAX_FAILURES_PER_ADDRESS) {
      throw new HttpException(
        { statusCode: 429, message: `Too many wrong pairing codes. Try again in ${PAIRING_WINDOW_MINUTES} minutes.` },
        HttpStatus.TOO_MANY_REQUESTS,
      );
    }
  }

  async recordFailure(stationId: number, clientAddress: string): Promise<void> {
    await this.failures.create({ stationId, clientAddress, createdAt: this.clock.now() });
  }

  private countRecent(stationId: number, clientAddress: string): Promise<[number, number]> {
    const since = { [Op.gt]: this.clock.fromNow(-PAIRING_WINDOW_MINUTES * 60_000) };
    return Promise.all([
      this.failures.count({ where: { stationId, createdAt: since } }),
      this.failures.count({ where: { clientAddress, createdAt: since } }),
    ]);
  }
}
