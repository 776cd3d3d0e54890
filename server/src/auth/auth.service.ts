import { Injectable, UnauthorizedException } from '@nestjs/common';
import type { SessionView } from '@mantlepiece/shared';
import { AuditService } from '../audit/audit.service.js';
import { Clock } from '../clock/clock.service.js';
import { InvitationsService } from '../users/invitations.service.js';
import type { User } from '../users/models/user.model.js';
import { PasswordHasher } from '../users/password-hasher.js';
import { toUserView } from '../users/users.presenter.js';
import { UsersService } from '../users/users.service.js';
import { AccessTokenService } from './access-token.service.js';
import { RefreshTokensService, type IssuedRefreshToken } from './refresh-tokens.service.js';
import { SignInAttemptsService } from './sign-in-attempts.service.js';

/** A session handed to the browser: the body it reads and the refresh cookie it keeps. */
export interface IssuedSession {
  session: SessionView;
  refresh: IssuedRefreshToken;
}

/** The one message for a wrong address and a wrong password alike, so neither can be probed. */
export const WRONG_CREDENTIALS = 'Email or password is incorrect.';

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly invitations: InvitationsService,
    private readonly hasher: PasswordHasher,
    private readonly accessTokens: AccessTokenService,
    private readonly refreshTokens: RefreshTokensService,
    private readonly signInAttempts: SignInAttemptsService,
    private readonly audit: AuditService,
    private readonly clock: Clock,
  ) {}

  async signIn(email: string, password: string, clientAddress: string): Promise<IssuedSession> {
    const address = email.trim().toLowerCase();
    await this.signInAttempts.assertAllowed(address, clientAddress);
    const user = await this.users.findByEmail(address);
    const passwordMatches = await this.hasher.verify(user?.passwordHash, password);
    if (!user || !user.active || !passwordMatches) {
      await this.signInAttempts.recordFailure(address, clientAddress);
      throw new UnauthorizedException(WRONG_CREDENTIALS);
    }
    await this.signInAttempts.clear(address);
    user.lastSignInAt = this.clock.now();
    await user.save();
    await this.audit.record({ actorId: user.id, action: 'auth.signed-in', targetType: 'user', targetId: user.id, clientAddress });
    return this.startSession(user, await this.refreshTokens.issue(user.id));
  }

  async refresh(token: string | undefined, clientAddress: string): Promise<IssuedSession> {
    const rotation = token
      ? await this.refreshTokens.rotate(token, async (id) => (await this.users.findActive(id)) !== null, clientAddress)
      : { ok: false as const };
    const user = rotation.ok ? await this.users.findActive(rotation.userId) : null;
    if (!rotation.ok || !user) throw new UnauthorizedException('Your session has ended. Sign in again.');
    return this.startSession(user, rotation.next);
  }

  async signOut(token: string | undefined): Promise<void> {
    if (token) await this.refreshTokens.revokeFamilyOf(token);
  }

  async acceptInvitation(token: string, name: string, password: string, clientAddress: string): Promise<IssuedSession> {
    const user = await this.invitations.accept(token, name, password, clientAddress);
    return this.startSession(user, await this.refreshTokens.issue(user.id));
  }

  private async startSession(user: User, refresh: IssuedRefreshToken): Promise<IssuedSession> {
    return { session: { accessToken: await this.accessTokens.issue(user.id), user: toUserView(user) }, refresh };
  }
}
