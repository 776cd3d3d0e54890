import { CanActivate, ExecutionContext, ForbiddenException, Injectable, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Role } from '@mantlepiece/shared';
import { isDeviceToken } from '../kiosks/device-token.js';
import { UsersService } from '../users/users.service.js';
import { AccessTokenService } from './access-token.service.js';
import { IS_PUBLIC, REQUIRED_ROLES } from './auth.decorators.js';
import type { AuthenticatedRequest } from './authenticated-request.js';

/**
 * Guards every route: a route is open only when marked @Public(); otherwise it needs a valid
 * access token of an active account, and, when marked @Roles(...), one of those roles.
 * The account is read on each request so a deactivation or role change counts at once.
 */
@Injectable()
export class AuthGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly tokens: AccessTokenService,
    private readonly users: UsersService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets)) return true;

    const request = context.switchToHttp().getRequest<AuthenticatedRequest>();
    const [scheme, token] = (request.headers.authorization ?? '').split(' ');
    // A kiosk's device token opens the kiosk routes and nothing else.
    if (scheme === 'Bearer' && token && isDeviceToken(token)) throw new ForbiddenException('A kiosk’s device token opens only the kiosk routes.');
    const userId = scheme === 'Bearer' && token ? await this.tokens.verify(token) : null;
    const user = userId === null ? null : await this.users.findActive(userId);
    if (!user) throw new UnauthorizedException('Sign in to continue.');
    request.user = user;

    const required = this.reflector.getAllAndOverride<Role[] | undefined>(REQUIRED_ROLES, targets);
    if (required?.length && !required.some((role) => user.roles.includes(role))) {
      throw new ForbiddenException('Your role does not allow this.');
    }
    return true;
  }
}
