import { HttpException, HttpStatus, Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import { AuditService } from '../audit/audit.service.js';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';
import { SignInFailure } from './models/sign-in-failure.model.js';

/**
 * Counts failed sign-ins per account and per client address in the database, so the limit holds
 * however many server instances share the load.
 */
@Injectable()
export class SignInAttemptsService {
  constructor(
    @InjectModel(SignInFailure) private readonly failures: typeof SignInFailure,
    private readonly audit: AuditService,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {}

  async assertAllowed(email: string, clientAddress: string): Promise<void> {
    const [forAccount, forAddress] = await this.countRecent(email, clientAddress);
    if (forAccount >= this.config.signInMaxFailuresPerAccount || forAddress >= this.config.signInMaxFailuresPerAddress) {
      throw this.tooMany();
    }
  }

  /** Records a failure; the one that reaches a limit is written to the audit trail. */
  async recordFailure(email: string, clientAddress: string): Promise<void> {
    await this.failures.create({ email, clientAddress, createdAt: this.clock.now() });
    const [forAccount, forAddress] = await this.countRecent(email, clientAddress);
    const scope =
      forAccount === this.config.signInMaxFailuresPerAccount ? 'account'
        : forAddress === this.config.signInMaxFailuresPerAddress ? 'address' : null;
    if (scope) {
      await this.audit.record({
        actorId: null, action: 'auth.sign-in-locked', targetType: 'email', targetId: email.slice(0, 64),
        detail: { scope, email, clientAddress, minutes: this.config.signInWindowMinutes }, clientAddress,
      });
    }
  }

  /** A successful sign-in or a new password clears the account's count (not the address's). */
  async clear(email: string): Promise<void> {
    await this.failures.destroy({ where: { email } });
  }

  private countRecent(email: string, clientAddress: string): Promise<[number, number]> {
    const since = { [Op.gt]: this.clock.fromNow(-this.config.signInWindowMinutes * 60_000) };
    return Promise.all([
      this.failures.count({ where: { email, createdAt: since } }),
      this.failures.count({ where: { clientAddress, createdAt: since } }),
    ]);
  }

  private tooMany(): HttpException {
    return new HttpException(
      { statusCode: 429, message: `Too many failed sign-ins. Try again in ${this.config.signInWindowMinutes} minutes.` },
      HttpStatus.TOO_MANY_REQUESTS,
    );
  }
}
