import { ROLES, type Role } from '@mantlepiece/shared';

/** Who may call a route: anyone, anyone signed in, or people holding one of some roles. */
export type Access = 'public' | 'signed-in' | readonly Role[];

const STAFF = ROLES;
const ADMIN = ['admin'] as const;

/**
 * The declared role matrix, `METHOD /path` as Express knows the route. The role-matrix suite walks
 * every route the app registers and fails on one missing here, so a new route needs a line.
 */
export const ROLE_MATRIX: Record<string, Access> = {
  'GET /api/health': 'public',
  'GET /api/kiosk/venue': 'public',

  'POST /api/auth/login': 'public',
  'POST /api/auth/refresh': 'public',
  'POST /api/auth/logout': 'public',
  'GET /api/auth/invitations/:token': 'public',
  'POST /api/auth/invitations/accept': 'public',
  'POST /api/auth/password-reset': 'public',
  'POST /api/auth/password-reset/complete': 'public',
  'GET /api/auth/me': 'signed-in',
  'PATCH /api/auth/me': 'signed-in',

  'GET /api/users': ADMIN,
  'POST /api/users/invitations': ADMIN,
  'PATCH /api/users/:id': ADMIN,
  'GET /api/audit': ADMIN,
  'GET /api/dev/mail': ADMIN,
  'GET /api/dev/mail/:id': ADMIN,

  'GET /api/widgets': STAFF,
  'POST /api/widgets/validate': STAFF,
};

/** The OpenAPI page and its files, registered by @nestjs/swagger: public, like any documentation. */
export const PUBLIC_PATH_PREFIXES = ['/api/docs'];
