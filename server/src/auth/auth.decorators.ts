import { createParamDecorator, SetMetadata, type ExecutionContext } from '@nestjs/common';
import type { Role } from '@mantlepiece/shared';
import type { AuthenticatedRequest } from './authenticated-request.js';

export const IS_PUBLIC = 'mantlepiece:public';
export const REQUIRED_ROLES = 'mantlepiece:roles';
export const FOR_ORGANISATION = 'mantlepiece:organisation';

/** Reachable without signing in. Every other route needs a valid access token. */
export const Public = () => SetMetadata(IS_PUBLIC, true);

/** Reachable by a signed-in person holding any one of these roles. */
export const Roles = (...roles: Role[]) => SetMetadata(REQUIRED_ROLES, roles);

/**
 * Reachable only by a person holding one of `@Roles(...)` on their account itself, at every venue:
 * what stands above any one venue (making or removing venues, every venue's mail). A venue admin
 * holds admin at their venue only and is refused.
 */
export const ForOrganisation = () => SetMetadata(FOR_ORGANISATION, true);

/** The signed-in person of a guarded route. */
export const CurrentUser = createParamDecorator(
  (_data: unknown, ctx: ExecutionContext) => ctx.switchToHttp().getRequest<AuthenticatedRequest>().user,
);
