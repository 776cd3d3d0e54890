import { Injectable } from '@nestjs/common';
import { AuditService } from '../audit/audit.service.js';
import { ConfigService } from '../config/config.service.js';
import { RateLimitsService, type RateLimit } from '../rate-limits/rate-limits.service.js';

const ACCOUNT_AND_ADDRESS = 'sign-in:account-address';
const ADDRESS = 'sign-in:address';
const ACCOUNT = 'sign-in:account';
const DAY_MS = 86_400_000;

/**
 * The limits on password checks (OWASP ASVS 4.0.3 V2.2.1). A flood of wrong passwords from one
 * address locks that address out of that account (and, past a larger count, out of every
 * account), but not the owner signing in from elsewhere; guesses at one account spread over many
 * addresses are slowed down instead: past a free allowance each try waits twice as long as the
 * last. Each check is taken from the limits before the password is hashed, so parallel requests
 * cannot all slip through.
 */
@Injectable()
export class SignInAttemptsService {
  constructor(
    private readonly limits: RateLimitsService,
    private readonly audit: AuditService,
    private readonly config: ConfigService,
  ) {}

  /** Takes one password check from the limits, the account's slow-down last, or throws 429. */
  async take(email: string, clientAddress: string): Promise<RateLimit[]> {
    return this.limits.take(this.limitsOf(email, clientAddress), 'Too many failed sign-ins.');
  }

  /** The right password: the account's counts start afresh and the address's check is given back. */
  async succeeded(email: string, clientAddress: string): Promise<void> {
    const [address, accountAndAddress, account] = this.limitsOf(email, clientAddress);
    await this.limits.clear(accountAndAddress.scope, accountAndAddress.subject);
    await this.limits.clear(account.scope, account.subject);
    await this.limits.refund([address]);
  }

  /** A wrong password; the one that uses up a limit is written to the audit trail. */
  async failed(email: string, clientAddress: string, spent: RateLimit[]): Promise<void> {
    for (const limit of spent) {
      await this.audit.record({
        actorId: null, action: 'auth.sign-in-locked', targetType: 'email', targetId: email.slice(0, 64),
        detail: { scope: limit.scope.replace('sign-in:', ''), email, clientAddress, minutes: Math.round(limit.windowMs / 60_000) },
        clientAddress,
      });
    }
  }

  /** A new password: every lock-out and slow-down of the account ends, from every address. */
  async clearAccount(email: string): Promise<void> {
    await this.limits.clear(ACCOUNT_AND_ADDRESS, { startsWith: `${email} ` });
    await this.limits.clear(ACCOUNT, email);
  }

  private limitsOf(email: string, clientAddress: string): [RateLimit, RateLimit, RateLimit] {
    const windowMs = this.config.signInWindowMinutes * 60_000;
    // The address first: once it is locked out, a flood of made-up addresses adds no rows.
    return [
      { scope: ADDRESS, subject: clientAddress, max: this.config.signInMaxFailuresPerAddress, windowMs },
      { scope: ACCOUNT_AND_ADDRESS, subject: `${email} ${clientAddress}`, max: this.config.signInMaxFailuresPerAccountAndAddress, windowMs },
      // About 20 tries in the first quarter hour, then one per window: roughly a hundred a day (NIST SP 800-63B 5.2.2).
      { scope: ACCOUNT, subject: email, max: this.config.signInFreeFailuresPerAccount, windowMs: DAY_MS, slowDown: { baseMs: 1000, maxMs: windowMs } },
    ];
  }
}
