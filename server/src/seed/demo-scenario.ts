import type { Orientation, Role } from '@mantlepiece/shared';

/** Our invented demo venue: nothing here describes a real place or person. */
export const DEMO_VENUE = {
  name: 'Basalt Point Earth Science Centre',
  slug: 'basalt-point',
  sourceLocale: 'en',
  targetLocales: ['fr', 'es'],
  /** An Atlantic-coast clock with daylight saving, far enough from UTC that its days visibly differ. */
  timeZone: 'America/Halifax',
};

export const DEMO_GALLERY = { name: 'Moving Plates Hall' };

export const DEMO_STATION = {
  name: 'Rift Table',
  screenWidthPx: 1920,
  screenHeightPx: 1080,
  orientation: 'landscape' as Orientation,
  mountingHeightMm: 1000,
};

/** Where the demo kiosk stands: a station of its own, so pairing a real screen at the Rift Table leaves it be. */
export const DEMO_KIOSK_STATION = {
  name: 'Plate Map Wall',
  screenWidthPx: 1920,
  screenHeightPx: 1080,
  orientation: 'landscape' as Orientation,
  mountingHeightMm: 1100,
};

/** Our second invented venue, a small volcano museum: its own staff, gallery, exhibit and story, so the boundary between venues shows. */
export const DEMO_SECOND_VENUE = {
  name: 'Cinder Hollow Volcano House',
  slug: 'cinder-hollow',
  sourceLocale: 'en',
  targetLocales: ['fr'],
  /** A clock on the other side of the world from the first venue's, with daylight saving of the southern summer. */
  timeZone: 'Pacific/Auckland',
};

export const DEMO_SECOND_GALLERY = { name: 'Magma Rooms' };

/** The demo venue an account works at: the first (Basalt Point) or the second (Cinder Hollow). */
export type DemoVenueKey = 'first' | 'second';
export const DEMO_VENUES: Record<DemoVenueKey, typeof DEMO_VENUE> = { first: DEMO_VENUE, second: DEMO_SECOND_VENUE };

export interface DemoAccount {
  email: string;
  name: string;
  /** Held at every venue: only the organisation admin's. */
  roles: Role[];
  locales: string[];
  memberships: { venue: DemoVenueKey; roles: Role[]; locales: string[] }[];
}

/** The organisation admin reaches every venue; everyone else is a member of the venues they work at. */
export const DEMO_ACCOUNTS: DemoAccount[] = [
  { email: 'admin@demo.test', name: 'Noor Haddad', roles: ['admin'], locales: [], memberships: [] },
  { email: 'curator@demo.test', name: 'Tomás Reyes', roles: [], locales: [], memberships: [{ venue: 'first', roles: ['curator'], locales: [] }] },
  {
    email: 'educator@demo.test', name: 'Ingrid Solberg', roles: [], locales: [],
    memberships: [{ venue: 'first', roles: ['educator'], locales: [] }, { venue: 'second', roles: ['educator'], locales: [] }],
  },
  { email: 'translator@demo.test', name: 'Camille Mercier', roles: [], locales: [], memberships: [{ venue: 'first', roles: ['translator'], locales: ['fr', 'es'] }] },
  { email: 'technician@demo.test', name: 'Kwame Asante', roles: [], locales: [], memberships: [{ venue: 'first', roles: ['technician'], locales: [] }] },
  { email: 'curator2@demo.test', name: 'Aiko Tanabe', roles: [], locales: [], memberships: [{ venue: 'second', roles: ['curator'], locales: [] }] },
];
