import { inScope, venueScope, type Member, type VenueGrant, type VenueScope } from '../auth/policy.js';

/**
 * Where an admin manages people: every venue for the organisation admin (`admin` held at every
 * venue), the venues of their admin memberships for a venue admin.
 */
export const peopleScope = (admin: Member): VenueScope => venueScope(admin, ['admin']);

interface Staff {
  roles: readonly string[];
  memberships?: readonly VenueGrant[];
}

/** Whether the admin reaches this person at all: a venue admin reaches the members of their venues. */
export const reaches = (scope: VenueScope, person: Staff): boolean =>
  scope.every || (person.memberships ?? []).some((grant) => inScope(scope, grant.venueId));

/**
 * Whether the person works only where the admin manages people, so a change to the whole account
 * (its name, deactivating it) touches no other venue's staff.
 */
export const holdsWhole = (scope: VenueScope, person: Staff): boolean =>
  scope.every || (person.roles.length === 0 && (person.memberships ?? []).every((grant) => inScope(scope, grant.venueId)));
