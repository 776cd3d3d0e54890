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

export const DEMO_ACCOUNTS: { email: string; name: string; roles: Role[]; locales: string[] }[] = [
  { email: 'admin@demo.test', name: 'Noor Haddad', roles: ['admin'], locales: [] },
  { email: 'curator@demo.test', name: 'Tomás Reyes', roles: ['curator'], locales: [] },
  { email: 'educator@demo.test', name: 'Ingrid Solberg', roles: ['educator'], locales: [] },
  { email: 'translator@demo.test', name: 'Camille Mercier', roles: ['translator'], locales: ['fr', 'es'] },
  { email: 'technician@demo.test', name: 'Kwame Asante', roles: ['technician'], locales: [] },
];
