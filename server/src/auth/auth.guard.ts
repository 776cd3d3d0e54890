import { ForbiddenException, Injectable, UnauthorizedException, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard as PassportAuthGuard } from '@nestjs/passport';
import type { Role } from '@mantlepiece/shared';
import { isDeviceToken } from '../kiosks/device-token.js';
import type { User } from '../users/models/user.model.js';
import { FOR_ORGANISATION, IS_PUBLIC, REQUIRED_ROLES } from './auth.decorators.js';
import type { AuthenticatedRequest } from './authenticated-request.js';
import { holdsAny, rolesAnywhere } from './policy.js';

const SIGN_IN_REQUIRED = 'Sign in to continue.';

/**
 * Guards every route: a route is open only when marked @Public(); otherwise it needs an access
 * token in the Authorization header (the bearer strategy) of an active account whose session has
 * not ended, and, when marked @Roles(...), one of those roles at some venue (which venue's object it may touch
 * is each service's check). The account and the session are
 * read on each request, so a deactivation, a sign-out or a role change counts at once.
 */
@Injectable()
export class AuthGuard extends PassportAuthGuard('bearer') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets)) return true;

    const request = context.switchToHttp().getRequest<AuthenticatedRequest>();
    const [scheme, token] = (request.headers.authorization ?? '').split(' ');
    // Only the header: a token in a URL ends up in logs and browser history.
    if (scheme !== 'Bearer' || !token) throw new UnauthorizedException(SIGN_IN_REQUIRED);
    // A kiosk's device token opens the kiosk routes and nothing else.
    if (isDeviceToken(token)) throw new ForbiddenException('A kiosk’s device token opens only the kiosk routes.');
    await super.canActivate(context);

    const required = this.reflector.getAllAndOverride<Role[] | undefined>(REQUIRED_ROLES, targets);
    if (required?.length && !holdsAny({ roles: rolesAnywhere(request.user) }, required)) {
      throw new ForbiddenException('Your role does not allow this.');
    }
    if (this.reflector.getAllAndOverride<boolean>(FOR_ORGANISATION, targets) && !holdsAny(request.user, required ?? [])) {
      throw new ForbiddenException('Only the organisation’s admin may do this; your role holds at your venues only.');
    }
    return true;
  }

  override handleRequest<TUser = User>(error: Error | null, user: TUser | false): TUser {
    if (error) throw error;
    if (!user) throw new UnauthorizedException(SIGN_IN_REQUIRED);
    return user;
  }
}
