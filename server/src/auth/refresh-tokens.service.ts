import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { createHmac, randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service.js';
import { Clock } from '../clock/clock.service.js';
import { hashToken, newToken } from '../common/tokens.js';
import { ConfigService } from '../config/config.service.js';
import { RefreshToken } from './models/refresh-token.model.js';

export interface IssuedRefreshToken {
  token: string;
  expiresAt: Date;
}

export type Rotation =
  | { ok: true; userId: number; sessionId: string; next: IssuedRefreshToken; rotatedAt: Date }
  | { ok: false };

/**
 * A session is a family of refresh tokens: sign-in starts one, each refresh rotates to the next
 * token of the family, and ending the session revokes the family. Access tokens name their
 * family, so the guard refuses them the moment it is revoked.
 */
@Injectable()
export class RefreshTokensService {
  /** Turns a token into its successor; only who holds the token can work the successor out. */
  private readonly successorKey: Buffer;

  constructor(
    @InjectModel(RefreshToken) private readonly tokens: typeof RefreshToken,
    private readonly sequelize: Sequelize,
    private readonly audit: AuditService,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {
    this.successorKey = createHmac('sha256', config.jwtSecret).update('mantlepiece refresh-token successor').digest();
  }

  /** Starts a new family (a new sign-in); its id is the session id. */
  async issue(userId: number, transaction?: Transaction): Promise<IssuedRefreshToken & { sessionId: string }> {
    const sessionId = randomUUID();
    return { sessionId, ...(await this.add(userId, sessionId, newToken(), transaction)) };
  }

  /**
   * Trades a refresh token for the next one of its family. The same token again within the grace
   * window (two tabs refreshing at once) gets the same successor; later, it is being replayed, by
   * a thief or by its owner after theft, and the whole family is revoked.
   * `isActive` says whether the token's account may still sign in.
   */
  async rotate(token: string, isActive: (userId: number) => Promise<boolean>, clientAddress: string): Promise<Rotation> {
    return this.sequelize.transaction(async (transaction) => {
      const current = await this.tokens.findOne({ where: { tokenHash: hashToken(token) }, transaction, lock: transaction.LOCK.UPDATE });
      if (!current || current.revokedAt) return { ok: false };
      const now = this.clock.now();
      const successor = this.successorOf(token);
      if (current.rotatedAt) {
        const next = current.rotatedAt.getTime() + this.config.refreshReuseGraceSeconds * 1000 > now.getTime()
          ? await this.tokens.findOne({ where: { tokenHash: hashToken(successor), revokedAt: null }, transaction })
          : null;
        if (next && (await isActive(current.userId))) {
          return { ok: true, userId: current.userId, sessionId: current.familyId, next: { token: successor, expiresAt: next.expiresAt }, rotatedAt: current.rotatedAt };
        }
        await this.revokeWhere({ familyId: current.familyId }, transaction);
        await this.audit.record({
          actorId: current.userId, action: 'auth.refresh-token-reused', targetType: 'user', targetId: current.userId,
          detail: { familyId: current.familyId }, clientAddress,
        }, transaction);
        return { ok: false };
      }
      if (current.expiresAt <= now || !(await isActive(current.userId))) return { ok: false };
      current.rotatedAt = now;
      await current.save({ transaction });
      const next = await this.add(current.userId, current.familyId, successor, transaction);
      return { ok: true, userId: current.userId, sessionId: current.familyId, next, rotatedAt: now };
    });
  }

  /** Whether the session an access token names is still going. */
  async isLive(sessionId: string, userId: number): Promise<boolean> {
    return (await this.tokens.count({ where: { familyId: sessionId, userId, revokedAt: null } })) > 0;
  }

  /** Sign-out: the token's whole family stops working, its access tokens with it. */
  async revokeFamilyOf(token: string): Promise<void> {
    const current = await this.tokens.findOne({ where: { tokenHash: hashToken(token) } });
    if (current) await this.revokeWhere({ familyId: current.familyId });
  }

  /** Every session of the account ends: a new password, a deactivation. */
  async revokeAllOf(userId: number, transaction?: Transaction): Promise<void> {
    await this.revokeWhere({ userId }, transaction);
  }

  private async add(userId: number, familyId: string, token: string, transaction?: Transaction): Promise<IssuedRefreshToken> {
    const expiresAt = this.clock.fromNow(this.config.refreshTokenTtlDays * 86_400_000);
    await this.tokens.create({ userId, familyId, tokenHash: hashToken(token), expiresAt }, { transaction });
    return { token, expiresAt };
  }

  private successorOf(token: string): string {
    return createHmac('sha256', this.successorKey).update(token).digest('base64url');
  }

  private async revokeWhere(where: { familyId: string } | { userId: number }, transaction?: Transaction): Promise<void> {
    await this.tokens.update({ revokedAt: this.clock.now() }, { where: { ...where, revokedAt: null }, transaction });
  }
}
