import { useCallback, useState } from 'react';
import { kioskLanguages } from '../app/i18n';
import type { KioskVenue } from '../app/venue';
import { AttractScreen } from './AttractScreen';
import { NotPairedScreen } from './NotPairedScreen';

/** The kiosk before pairing: the attract loop, and the honest answer to a touch. */
export function KioskScreens({ venue }: { venue: KioskVenue }) {
  const [touched, setTouched] = useState(false);
  const languages = kioskLanguages(venue.locales);
  const backToAttract = useCallback(() => setTouched(false), []);
  return touched
    ? <NotPairedScreen languages={languages} onBack={backToAttract} />
    : <AttractScreen venueName={venue.name} languages={languages} onTouch={() => setTouched(true)} />;
}
