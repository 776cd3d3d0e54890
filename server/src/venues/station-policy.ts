import type { Role, StationCan } from '@mantlepiece/shared';
import { holdsAny, type Person } from '../auth/policy.js';
import { FLEET_KEEPERS } from '../kiosks/kiosk-policy.js';

/** Who sets a venue up: its galleries, stations and exhibits. */
export const SETTINGS_KEEPERS: readonly Role[] = ['admin'];

/** The station policy: the fleet's keepers pair kiosks at it, the venue's admins change it. */
export const stationCan = (person: Person): StationCan => ({
  pair: holdsAny(person, FLEET_KEEPERS),
  edit: holdsAny(person, SETTINGS_KEEPERS),
});
