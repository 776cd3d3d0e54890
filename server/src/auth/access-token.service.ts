import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';

interface AccessTokenClaims {
  sub: string;
}

/** Short-lived bearer tokens. Issued and checked against our clock, so tests can let them expire. */
@Injectable()
export class AccessTokenService {
  constructor(
    private readonly jwt: JwtService,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {}

  issue(userId: number): Promise<string> {
    return this.jwt.signAsync(
      { sub: String(userId), iat: this.nowSeconds() },
      { expiresIn: this.config.accessTokenTtlSeconds },
    );
  }

  /** The user id the token was issued to, or null when it is missing, forged or expired. */
  async verify(token: string): Promise<number | null> {
    try {
      const claims = await this.jwt.verifyAsync<AccessTokenClaims>(token, { clockTimestamp: this.nowSeconds() });
      const id = Number(claims.sub);
      return Number.isInteger(id) ? id : null;
    } catch {
      return null;
    }
  }

  private nowSeconds(): number {
    return Math.floor(this.clock.now().getTime() / 1000);
  }
}
