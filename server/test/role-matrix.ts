import { ROLES, type Role } from '@mantlepiece/shared';

/** Who may call a route: anyone, anyone signed in, or people holding one of some roles. */
/** 'kiosk': a paired kiosk's device token, never a person's sign-in. */
export type Access = 'public' | 'signed-in' | 'kiosk' | readonly Role[];

const STAFF = ROLES;
const ADMIN = ['admin'] as const;
const CURATOR = ['curator'] as const;
const TECHNICIAN = ['technician', 'admin'] as const;
/** Translation routes: translators in their own locales (the service checks which), admins and curators reading all. */
const TRANSLATION_READERS = ['admin', 'curator', 'translator'] as const;
const TRANSLATOR = ['translator'] as const;
const EDUCATOR = ['educator'] as const;
const REVIEW_TALK = ['curator', 'educator'] as const;

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
  'PUT /api/users/:id/memberships/:venueId': ADMIN,
  'DELETE /api/users/:id/memberships/:venueId': ADMIN,
  'GET /api/audit': ADMIN,
  'GET /api/dev/mail': ADMIN,
  'GET /api/dev/mail/:id': ADMIN,

  'GET /api/widgets': STAFF,
  'POST /api/widgets/validate': STAFF,

  'GET /api/venues': STAFF,
  'GET /api/venues/:id': STAFF,
  'POST /api/venues': ADMIN,
  'PATCH /api/venues/:id': ADMIN,
  'DELETE /api/venues/:id': ADMIN,
  'GET /api/galleries': STAFF,
  'GET /api/galleries/:id': STAFF,
  'POST /api/galleries': ADMIN,
  'PATCH /api/galleries/:id': ADMIN,
  'DELETE /api/galleries/:id': ADMIN,
  'GET /api/stations': STAFF,
  'GET /api/stations/:id': STAFF,
  'POST /api/stations': ADMIN,
  'PATCH /api/stations/:id': ADMIN,
  'DELETE /api/stations/:id': ADMIN,
  'GET /api/exhibits': STAFF,
  'GET /api/exhibits/:id': STAFF,
  'POST /api/exhibits': ADMIN,
  'PATCH /api/exhibits/:id': ADMIN,
  'DELETE /api/exhibits/:id': ADMIN,

  'GET /api/stories': STAFF,
  'GET /api/stories/:id': STAFF,
  'POST /api/stories': CURATOR,
  'PATCH /api/stories/:id': CURATOR,
  'DELETE /api/stories/:id': CURATOR,
  'POST /api/stories/:storyId/panels': CURATOR,
  'POST /api/stories/:storyId/panels/reorder': CURATOR,
  'PUT /api/panels/:id': CURATOR,
  'PATCH /api/panels/:id': CURATOR,
  'DELETE /api/panels/:id': CURATOR,
  'POST /api/panels/:id/restore': CURATOR,

  'GET /api/media': STAFF,
  'GET /api/media/licences': STAFF,
  'GET /api/media/:id': STAFF,
  'POST /api/media': CURATOR,
  'PATCH /api/media/:id': CURATOR,
  'DELETE /api/media/:id': CURATOR,
  'POST /api/media/:id/restore': CURATOR,
  'POST /api/media/:id/renditions/retry': CURATOR,

  'GET /api/translations/stories': TRANSLATION_READERS,
  'GET /api/stories/:id/translations': TRANSLATION_READERS,
  'GET /api/stories/:id/translations/:locale/units': TRANSLATION_READERS,
  'PUT /api/stories/:id/translations/:locale/units/:unitId': TRANSLATOR,
  'GET /api/stories/:id/translations/:locale/preview': TRANSLATION_READERS,
  'GET /api/stories/:id/translations/:locale/xliff': TRANSLATION_READERS,
  'PUT /api/stories/:id/translations/:locale/xliff': TRANSLATOR,

  'POST /api/stories/:id/submit': CURATOR,
  'POST /api/stories/:id/withdraw': CURATOR,
  'POST /api/stories/:id/revise': CURATOR,
  'POST /api/stories/:id/retire': ['curator', 'admin'],
  'GET /api/stories/:id/revisions': STAFF,
  'GET /api/stories/:id/preflight': STAFF,
  'GET /api/revisions/:id': STAFF,
  'GET /api/revisions/:id/compare': STAFF,
  'GET /api/reviews/queue': EDUCATOR,
  'POST /api/revisions/:id/reviews': EDUCATOR,
  'POST /api/revisions/:id/comments': REVIEW_TALK,
  'PATCH /api/comments/:id': REVIEW_TALK,
  'GET /api/notifications': 'signed-in',
  'POST /api/notifications/read': 'signed-in',
  'GET /api/notifications/preferences': 'signed-in',
  'PUT /api/notifications/preferences': 'signed-in',

  'POST /api/galleries/:id/releases': TECHNICIAN,
  'GET /api/galleries/:id/releases/preview': TECHNICIAN,
  'GET /api/galleries/:id/releases': STAFF,
  'GET /api/releases/compare': STAFF,
  'GET /api/releases/:id': STAFF,
  'GET /api/releases/:id/manifest': STAFF,
  'POST /api/releases/:id/publish': TECHNICIAN,
  'GET /api/venues/:id/signing-key': STAFF,
  'POST /api/stations/:id/pair': TECHNICIAN,
  'GET /api/kiosks': TECHNICIAN,
  'POST /api/kiosks/:id/revoke': TECHNICIAN,
  'GET /api/kiosks/:id': TECHNICIAN,
  'POST /api/kiosk/pair/start': 'public',
  'POST /api/kiosk/pair/complete': 'public',
  'GET /api/kiosk/manifest': 'kiosk',
  'GET /api/kiosk/files/:sha256': 'kiosk',
  'POST /api/kiosk/heartbeat': 'kiosk',
  'POST /api/kiosk/events': 'kiosk',

  'GET /api/insights': ['curator', 'educator', 'technician', 'admin'],
  'GET /api/me/work': 'signed-in',
  'GET /api/search': STAFF,
};

/**
 * The OpenAPI page and its files, registered by @nestjs/swagger: public, like any documentation.
 * Media renditions, for <img> tags: content-addressed and immutable, outside /api (Nest also
 * mounts an ALL not-found handler on that excluded path).
 */
export const PUBLIC_PATH_PREFIXES = ['/api/docs', '/media/'];

/** The objects a route's path can name, each belonging to one venue. */
export type VenueObject =
  | 'venue' | 'gallery' | 'station' | 'exhibit' | 'story' | 'panel' | 'media' | 'revision' | 'comment' | 'release' | 'kiosk' | 'person';

/**
 * How a route meets venues, for a person who belongs to one venue only:
 * - 'any venue': about no venue's things (signing in, one's own profile and notifications, widget
 *   rules, the kiosk routes, whose device token names its gallery);
 * - 'own venues': a list, or something new, of the caller's venues only;
 * - 'organisation': the organisation admin's alone; a venue admin is refused (403);
 * - a venue object: the path names one, and another venue's answers exactly as a missing one does.
 */
export type VenueReach = 'any venue' | 'own venues' | 'organisation' | VenueObject;

const OBJECT_COLLECTIONS: Record<string, VenueObject> = {
  venues: 'venue', galleries: 'gallery', stations: 'station', exhibits: 'exhibit', stories: 'story', panels: 'panel',
  media: 'media', revisions: 'revision', comments: 'comment', releases: 'release', kiosks: 'kiosk', users: 'person',
};

/** Routes for the organisation admin alone: venues are made and removed above any one venue, and dev mail holds every venue's. */
const ORGANISATION_ROUTES = ['POST /api/venues', 'DELETE /api/venues/:id', 'GET /api/dev/mail', 'GET /api/dev/mail/:id'];

/** Routes about no venue's things although they need a role. */
const ANY_VENUE_ROUTES = ['GET /api/widgets', 'POST /api/widgets/validate', 'GET /api/media/licences'];

/** How `route` meets venues: read from its path (`/api/<collection>/:id…` names that collection's object). */
export function venueReach(route: string): VenueReach {
  const access = ROLE_MATRIX[route];
  if (access === undefined) throw new Error(`${route} is not in the role matrix`);
  if (ORGANISATION_ROUTES.includes(route)) return 'organisation';
  if (typeof access === 'string' || ANY_VENUE_ROUTES.includes(route)) return 'any venue';
  const [, , collection, parameter] = route.split(' ')[1]!.split('/');
  return parameter?.startsWith(':') && collection! in OBJECT_COLLECTIONS ? OBJECT_COLLECTIONS[collection!]! : 'own venues';
}
