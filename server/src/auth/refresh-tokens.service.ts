import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { randomUUID } from 'node:crypto';
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

export type Rotation = { ok: true; userId: number; next: IssuedRefreshToken } | { ok: false };

@Injectable()
export class RefreshTokensService {
  constructor(
    @InjectModel(RefreshToken) private readonly tokens: typeof RefreshToken,
    private readonly sequelize: Sequelize,
    private readonly audit: AuditService,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {}

  /** Starts a new family (a new sign-in), or continues one on rotation. */
  async issue(userId: number, familyId: string = randomUUID(), transaction?: Transaction): Promise<IssuedRefreshToken> {
    const token = newToken();
    const expiresAt = this.clock.fromNow(this.config.refreshTokenTtlDays * 86_400_000);
    await this.tokens.create({ userId, familyId, tokenHash: hashToken(token), expiresAt }, { transaction });
    return { token, expiresAt };
  }

  /**
   * Trades a refresh token for the next one of its family. A token that was already rotated is
   * being replayed, by a thief or by its owner after theft: the whole family is revoked.
   * `isActive` says whether the token's account may still sign in.
   */
  async rotate(token: string, isActive: (userId: number) => Promise<boolean>, clientAddress: string): Promise<Rotation> {
    return this.sequelize.transaction(async (transaction) => {
      const current = await this.tokens.findOne({ where: { tokenHash: hashToken(token) }, transaction, lock: transaction.LOCK.UPDATE });
      if (!current || current.revokedAt) return { ok: false };
      if (current.rotatedAt) {
        await this.revokeWhere({ familyId: current.familyId }, transaction);
        await this.audit.record({
          actorId: current.userId, action: 'auth.refresh-token-reused', targetType: 'user', targetId: current.userId,
          detail: { familyId: current.familyId }, clientAddress,
        }, transaction);
        return { ok: false };
      }
      if (current.expiresAt <= this.clock.now() || !(await isActive(current.userId))) return { ok: false };
      current.rotatedAt = this.clock.now();
      await current.save({ transaction });
      return { ok: true, userId: current.userId, next: await this.issue(current.userId, current.familyId, transaction) };
    });
  }

  /** Sign-out: the token's whole family stops working. */
  async revokeFamilyOf(token: string): Promise<void> {
    const current = await this.tokens.findOne({ where: { tokenHash: hashToken(token) } });
    if (current) await this.revokeWhere({ familyId: current.familyId });
  }

  async revokeAllOf(userId: number, transaction?: Transaction): Promise<void> {
    await this.revokeWhere({ userId }, transaction);
  }

  private async revokeWhere(where: { familyId: string } | { userId: number }, transaction?: Transaction): Promise<void> {
    await this.tokens.update({ revokedAt: this.clock.now() }, { where: { ...where, revokedAt: null }, transaction });
  }
}
