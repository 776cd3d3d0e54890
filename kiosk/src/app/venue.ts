import { useEffect, useState } from 'react';

/** The public view of the default venue, for the attract loop before the kiosk is paired. */
export interface KioskVenue {
  name: string;
  locales: string[];
}

export type VenueState = { status: 'loading' } | { status: 'ready'; venue: KioskVenue } | { status: 'offline' };

// A kiosk runs for months: when the server is away it keeps asking, calmly.
const RETRY_MS = 30_000;

async function fetchVenue(): Promise<KioskVenue> {
  const response = await fetch('/api/kiosk/venue', { headers: { Accept: 'application/json' } });
  if (!response.ok) throw new Error(`GET /api/kiosk/venue answered ${response.status}`);
  return (await response.json()) as KioskVenue;
}

export function useVenue(): VenueState {
  const [state, setState] = useState<VenueState>({ status: 'loading' });
  useEffect(() => {
    let cancelled = false;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const load = () => {
      fetchVenue().then(
        (venue) => { if (!cancelled) setState({ status: 'ready', venue }); },
        () => {
          if (cancelled) return;
          setState((current) => (current.status === 'ready' ? current : { status: 'offline' }));
          timer = setTimeout(load, RETRY_MS);
        },
      );
    };
    load();
    return () => {
      cancelled = true;
      clearTimeout(timer);
    };
  }, []);
  return state;
}
