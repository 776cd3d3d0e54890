import type { Role, UserView, VenueView } from '@mantlepiece/shared';
import { useCurrentVenue } from '../../app/current-venue';
import { useCurrentUser } from '../../api/session';

export interface ManagedVenues {
  /** The venues whose people the signed-in admin manages. */
  venues: VenueView[];
  /** Whether they may give roles at every venue: the organisation admin alone. */
  everyVenue: boolean;
  /** The venue a new grant starts at: the current one when it is theirs (an invitation is usually to one venue). */
  initialVenueId: number | null;
  venueName: (venueId: number) => string;
}

/** Where the signed-in admin manages people, as the server decides it: every venue for the organisation admin, their admin memberships' venues otherwise. */
export function useManagedVenues(): ManagedVenues {
  const user = useCurrentUser();
  const { venues: reachable, venue } = useCurrentVenue();
  const everyVenue = user.roles.includes('admin');
  const venues = everyVenue ? reachable : reachable.filter((candidate) => user.memberships.some((grant) => grant.venueId === candidate.id && grant.roles.includes('admin')));
  const initialVenueId = venue && venues.some((candidate) => candidate.id === venue.id) ? venue.id : (venues[0]?.id ?? null);
  const venueName = (venueId: number) => reachable.find((candidate) => candidate.id === venueId)?.name ?? `#${venueId}`;
  return { venues, everyVenue, initialVenueId, venueName };
}

/** The roles and locales a person holds by one grant: at every venue (null) or by their membership at a venue. */
export function grantOf(person: UserView, venueId: number | null): { roles: Role[]; locales: string[] } {
  if (venueId === null) return { roles: person.roles, locales: person.locales };
  const membership = person.memberships.find((grant) => grant.venueId === venueId);
  return { roles: membership?.roles ?? [], locales: membership?.locales ?? [] };
}
