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

/** The rules of signing in and of sessions; the passport strategies call them. */
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

  /** The account these credentials open, within the sign-in limits; 401 or 429 otherwise. */
  async checkCredentials(email: string, password: string, clientAddress: string): Promise<User> {
    const address = email.trim().toLowerCase();
    const spent = await this.signInAttempts.take(address, clientAddress);
    const user = await this.users.findByEmail(address);
    const passwordMatches = await this.hasher.verify(user?.passwordHash, password);
    if (!user || !user.active || !passwordMatches) {
      await this.signInAttempts.failed(address, clientAddress, spent);
      throw new UnauthorizedException(WRONG_CREDENTIALS);
    }
    await this.signInAttempts.succeeded(address, clientAddress);
    return user;
  }

  /** Starts a session for a person whose credentials were just checked. */
  async signIn(user: User, clientAddress: string): Promise<IssuedSession> {
    user.lastSignInAt = this.clock.now();
    await user.save();
    await this.audit.record({ actorId: user.id, action: 'auth.signed-in', targetType: 'user', targetId: user.id, clientAddress });
    return this.startSession(user);
  }

  /** The active person an access token was issued to, while its session lasts; null otherwise. */
  async personOf(accessToken: string): Promise<User | null> {
    const holder = await this.accessTokens.verify(accessToken);
    if (!holder) return null;
    const [user, live] = await Promise.all([this.users.findActive(holder.userId), this.refreshTokens.isLive(holder.sessionId, holder.userId)]);
    return live ? user : null;
  }

  async refresh(token: string | undefined, clientAddress: string): Promise<IssuedSession> {
    const rotation = token
      ? await this.refreshTokens.rotate(token, async (id) => (await this.users.findActive(id)) !== null, clientAddress)
      : { ok: false as const };
    const user = rotation.ok ? await this.users.findActive(rotation.userId) : null;
    if (!rotation.ok || !user) throw new UnauthorizedException('Your session has ended. Sign in again.');
    const accessToken = await this.accessTokens.issue({ userId: user.id, sessionId: rotation.sessionId }, rotation.rotatedAt);
    return { session: { accessToken, user: toUserView(user) }, refresh: rotation.next };
  }

  async signOut(token: string | undefined): Promise<void> {
    if (token) await this.refreshTokens.revokeFamilyOf(token);
  }

  async acceptInvitation(token: string, name: string, password: string, clientAddress: string): Promise<IssuedSession> {
    return this.startSession(await this.invitations.accept(token, name, password, clientAddress));
  }

  private async startSession(user: User): Promise<IssuedSession> {
    const { sessionId, ...refresh } = await this.refreshTokens.issue(user.id);
    return { session: { accessToken: await this.accessTokens.issue({ userId: user.id, sessionId }), user: toUserView(user) }, refresh };
  }
}
