import { GoneException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service.js';
import { Clock } from '../clock/clock.service.js';
import { hashToken, newToken } from '../common/tokens.js';
import { ConfigService } from '../config/config.service.js';
import type { ClaimQueue } from '../jobs/claim-queue.js';
import { JobClaims } from '../jobs/job-claims.service.js';
import { MailService } from '../mail/mail.service.js';
import { RateLimitsService } from '../rate-limits/rate-limits.service.js';
import { User } from '../users/models/user.model.js';
import { PasswordHasher } from '../users/password-hasher.js';
import { UsersService } from '../users/users.service.js';
import { PasswordResetRequest } from './models/password-reset-request.model.js';
import { PasswordReset } from './models/password-reset.model.js';
import { RefreshTokensService } from './refresh-tokens.service.js';
import { SignInAttemptsService } from './sign-in-attempts.service.js';

const HOUR_MS = 3_600_000;
const BATCH = 20;
const CLAIM_MS = 60_000;

/**
 * Password reset by e-mail link: works once, until it expires, and only while it is the
 * account's newest; only its hash is stored. Requests are queued, so answering one takes the
 * same work whether or not the address has an account.
 */
@Injectable()
export class PasswordResetsService {
  private readonly queue: ClaimQueue<PasswordResetRequest>;

  constructor(
    @InjectModel(PasswordReset) private readonly resets: typeof PasswordReset,
    @InjectModel(PasswordResetRequest) private readonly requests: typeof PasswordResetRequest,
    claims: JobClaims,
    private readonly sequelize: Sequelize,
    private readonly users: UsersService,
    private readonly hasher: PasswordHasher,
    private readonly refreshTokens: RefreshTokensService,
    private readonly signInAttempts: SignInAttemptsService,
    private readonly limits: RateLimitsService,
    private readonly mail: MailService,
    private readonly audit: AuditService,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {
    this.queue = claims.queue(requests, CLAIM_MS);
  }

  /** Queues the request, within the limits per typed address and per client address; says nothing more. */
  async requestReset(email: string, clientAddress: string): Promise<void> {
    await this.limits.take([
      { scope: 'password-reset:address', subject: clientAddress, max: this.config.passwordResetsPerAddressPerHour, windowMs: HOUR_MS },
      { scope: 'password-reset:account', subject: email, max: this.config.passwordResetsPerAccountPerHour, windowMs: HOUR_MS },
    ], 'Too many password reset requests.');
    await this.requests.create({ email, clientAddress });
  }

  /**
   * The worker's part: a link for each queued request whose address has an active account; older
   * links stop working. Requests are claimed (see ClaimQueue), and each is marked processed in the
   * transaction that queues its mail, so a request is mailed once however many instances poll.
   * Returns how many requests it processed.
   */
  async mailRequestedLinks(): Promise<number> {
    const claimed = await this.queue.claim({ processedAt: null }, { order: [['id', 'ASC']], limit: BATCH });
    for (const request of claimed) await this.process(request);
    return claimed.length;
  }

  /** Sets the new password, uses up the link, voids the account's other links and ends all its sessions. */
  async completeReset(token: string, password: string, clientAddress: string): Promise<void> {
    const passwordHash = await this.hasher.hash(password);
    const email = await this.sequelize.transaction(async (transaction) => {
      const reset = await this.resets.findOne({
        where: { tokenHash: hashToken(token) }, include: [User], transaction, lock: transaction.LOCK.UPDATE,
      });
      if (!reset?.user) throw new NotFoundException('This password reset link is not valid.');
      const now = this.clock.now();
      if (reset.usedAt || reset.voidedAt || reset.expiresAt <= now) {
        throw new GoneException('This password reset link has expired or was already used. Ask for a new one.');
      }
      reset.usedAt = now;
      await reset.save({ transaction });
      await this.voidLinksOf(reset.userId, transaction);
      reset.user.passwordHash = passwordHash;
      await reset.user.save({ transaction });
      await this.refreshTokens.revokeAllOf(reset.userId, transaction);
      await this.audit.record({
        actorId: reset.userId, action: 'auth.password-reset', targetType: 'user', targetId: reset.userId, clientAddress,
      }, transaction);
      return reset.user.email;
    });
    await this.signInAttempts.clearAccount(email);
  }

  private async process(request: PasswordResetRequest): Promise<void> {
    const user = await this.users.findByEmail(request.email);
    const token = newToken();
    await this.sequelize.transaction(async (transaction) => {
      // Lost to another instance after this one's claim ran out: that one mails it.
      if (!(await this.queue.settle(request.id, { processedAt: this.clock.now() }, transaction))) return;
      if (!user?.active) return;
      await this.voidLinksOf(user.id, transaction);
      const reset = await this.resets.create({
        userId: user.id,
        tokenHash: hashToken(token),
        expiresAt: this.clock.fromNow(this.config.passwordResetTtlMinutes * 60_000),
      }, { transaction });
      await this.mail.enqueue(user.email, user.uiLanguage, {
        kind: 'password-reset', name: user.name, link: this.mail.studioLink(`/reset-password/${token}`), expiresAt: reset.expiresAt,
      }, transaction);
    });
  }

  private async voidLinksOf(userId: number, transaction: Transaction): Promise<void> {
    await this.resets.update(
      { voidedAt: this.clock.now() },
      { where: { userId, usedAt: null, voidedAt: null, expiresAt: { [Op.gt]: this.clock.now() } }, transaction },
    );
  }
}
