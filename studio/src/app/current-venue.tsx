import { createContext, useCallback, useContext, useMemo, useState } from 'react';
import type { Role, UserView, VenueView } from '@mantlepiece/shared';
import { useCurrentUser } from '../api/session';
import { useVenues } from '../api/settings';
import { CHOICES_BY_NAME } from '../components/lists/list-search';

export interface CurrentVenue {
  /** The venues the person works at, by name; the switcher offers them when there are several. */
  venues: VenueView[];
  /** The venue the studio shows; null until the venues are read, or when there are none. */
  venue: VenueView | null;
  choose: (venueId: number) => void;
  /** The person's roles and translator locales at the current venue: those held everywhere and those of its membership. */
  roles: Role[];
  locales: string[];
}

const CurrentVenueContext = createContext<CurrentVenue | null>(null);

const storageKey = (userId: number) => `mantlepiece.venue.${userId}`;

function storedVenue(userId: number): number | null {
  try {
    const value = Number(window.localStorage.getItem(storageKey(userId)));
    return Number.isInteger(value) && value > 0 ? value : null;
  } catch {
    return null;
  }
}

/** The grant at one venue joined to what holds everywhere, as the server's policy reads it. */
function grantsAt(user: UserView, venueId: number | undefined): { roles: Role[]; locales: string[] } {
  const membership = user.memberships.find((grant) => grant.venueId === venueId);
  return {
    roles: [...new Set([...user.roles, ...(membership?.roles ?? [])])],
    locales: [...new Set([...user.locales, ...(membership?.locales ?? [])])],
  };
}

/**
 * The studio's current venue: remembered per person in this browser, by default their first. A
 * person with roles at every venue works at all of them; anyone else at their memberships' venues.
 */
export function CurrentVenueProvider({ children }: { children: React.ReactNode }) {
  const user = useCurrentUser();
  const { data } = useVenues(CHOICES_BY_NAME);
  const [chosen, setChosen] = useState(() => storedVenue(user.id));

  const venues = useMemo(() => {
    const all = data?.items ?? [];
    return user.roles.length > 0 ? all : all.filter((venue) => user.memberships.some((grant) => grant.venueId === venue.id));
  }, [data, user]);
  const venue = venues.find((candidate) => candidate.id === chosen) ?? venues[0] ?? null;

  const choose = useCallback((venueId: number) => {
    setChosen(venueId);
    try {
      window.localStorage.setItem(storageKey(user.id), String(venueId));
    } catch {
      // A browser that keeps nothing still switches for this visit.
    }
  }, [user.id]);

  const value = useMemo<CurrentVenue>(() => ({ venues, venue, choose, ...grantsAt(user, venue?.id) }), [venues, venue, choose, user]);
  return <CurrentVenueContext.Provider value={value}>{children}</CurrentVenueContext.Provider>;
}

export function useCurrentVenue(): CurrentVenue {
  const context = useContext(CurrentVenueContext);
  if (!context) throw new Error('useCurrentVenue needs the CurrentVenueProvider of the signed-in studio');
  return context;
}

/** The `venueId` filter a list sends: the current venue's, once known (none outside the signed-in studio). */
export const useVenueFilter = (): { venueId?: number } => {
  const venue = useContext(CurrentVenueContext)?.venue;
  return venue ? { venueId: venue.id } : {};
};

/** The signed-in person as the current venue sees them: the roles and locales they hold there. */
export function usePersonHere(): UserView {
  const user = useCurrentUser();
  const { roles, locales } = useCurrentVenue();
  return useMemo(() => ({ ...user, roles, locales }), [user, roles, locales]);
}
