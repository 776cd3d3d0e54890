import { GoneException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service.js';
import { Clock } from '../clock/clock.service.js';
import { hashToken, newToken } from '../common/tokens.js';
import { ConfigService } from '../config/config.service.js';
import { MailService } from '../mail/mail.service.js';
import { User } from '../users/models/user.model.js';
import { PasswordHasher } from '../users/password-hasher.js';
import { UsersService } from '../users/users.service.js';
import { PasswordReset } from './models/password-reset.model.js';
import { RefreshTokensService } from './refresh-tokens.service.js';
import { SignInAttemptsService } from './sign-in-attempts.service.js';

/** Password reset by e-mail link: works once, until it expires; only its hash is stored. */
@Injectable()
export class PasswordResetsService {
  constructor(
    @InjectModel(PasswordReset) private readonly resets: typeof PasswordReset,
    private readonly sequelize: Sequelize,
    private readonly users: UsersService,
    private readonly hasher: PasswordHasher,
    private readonly refreshTokens: RefreshTokensService,
    private readonly signInAttempts: SignInAttemptsService,
    private readonly mail: MailService,
    private readonly audit: AuditService,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {}

  /** Sends the link when the address belongs to an active account; says nothing either way. */
  async requestReset(email: string): Promise<void> {
    const user = await this.users.findByEmail(email);
    if (!user?.active) return;
    const token = newToken();
    await this.sequelize.transaction(async (transaction) => {
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

  /** Sets the new password, uses up the link and signs the account out everywhere. */
  async completeReset(token: string, password: string, clientAddress: string): Promise<void> {
    const passwordHash = await this.hasher.hash(password);
    const email = await this.sequelize.transaction(async (transaction) => {
      const reset = await this.resets.findOne({
        where: { tokenHash: hashToken(token) }, include: [User], transaction, lock: transaction.LOCK.UPDATE,
      });
      if (!reset?.user) throw new NotFoundException('This password reset link is not valid.');
      if (reset.usedAt || reset.expiresAt <= this.clock.now()) {
        throw new GoneException('This password reset link has expired or was already used. Ask for a new one.');
      }
      reset.usedAt = this.clock.now();
      await reset.save({ transaction });
      reset.user.passwordHash = passwordHash;
      await reset.user.save({ transaction });
      await this.refreshTokens.revokeAllOf(reset.userId, transaction);
      await this.audit.record({
        actorId: reset.userId, action: 'auth.password-reset', targetType: 'user', targetId: reset.userId, clientAddress,
      }, transaction);
      return reset.user.email;
    });
    await this.signInAttempts.clear(email);
  }
}
