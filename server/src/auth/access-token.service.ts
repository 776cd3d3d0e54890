import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';

interface AccessTokenClaims {
  sub: string;
  /** The session (refresh-token family) the token belongs to: ending the session ends the token. */
  sid: string;
}

export interface AccessTokenHolder {
  userId: number;
  sessionId: string;
}

/** Short-lived bearer tokens. Issued and checked against our clock, so tests can let them expire. */
@Injectable()
export class AccessTokenService {
  constructor(
    private readonly jwt: JwtService,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {}

  /** The same holder and moment give the same token, so a refresh answered twice hands out one pair. */
  issue({ userId, sessionId }: AccessTokenHolder, issuedAt: Date = this.clock.now()): Promise<string> {
    return this.jwt.signAsync(
      { sub: String(userId), sid: sessionId, iat: Math.floor(issuedAt.getTime() / 1000) },
      { expiresIn: this.config.accessTokenTtlSeconds },
    );
  }

  /** Whose token it is and of which session, or null when it is missing, forged or expired. */
  async verify(token: string): Promise<AccessTokenHolder | null> {
    try {
      const claims = await this.jwt.verifyAsync<AccessTokenClaims>(token, { clockTimestamp: Math.floor(this.clock.now().getTime() / 1000) });
      const userId = Number(claims.sub);
      return Number.isInteger(userId) && typeof claims.sid === 'string' ? { userId, sessionId: claims.sid } : null;
    } catch {
      return null;
    }
  }
}
