import { kioskLanguages } from '../app/i18n';
import type { KioskVenue } from '../app/kiosk-api';
import { Multilingual } from '../screens/Multilingual';
import type { PairingStatus } from './pairing';

/**
 * A kiosk with no credential: the pairing code, very large, and what a technician does with it;
 * after a revocation, first that this screen was unpaired.
 */
export function PairingScreen({ status, venue, unpairedAt = null }: { status: PairingStatus | null; venue: KioskVenue; unpairedAt?: string | null }) {
  const languages = kioskLanguages(venue.locales);
  const code = status?.kind === 'code' ? status.code.pairingCode : null;
  return (
    <main className="notice pairing">
      {venue.name ? <p className="venue-small">{venue.name}</p> : null}
      <Multilingual languages={languages}>
        {(t, primary) => (primary ? <h1>{t('notPaired.title')}</h1> : <h2>{t('notPaired.title')}</h2>)}
      </Multilingual>
      {unpairedAt ? (
        <div role="status" data-unpaired-at={unpairedAt}>
          <Multilingual languages={languages}>{(t) => <p>{t('pairing.unpaired')}</p>}</Multilingual>
        </div>
      ) : null}
      {code ? (
        <figure className="pairing-code">
          <figcaption><Multilingual languages={languages} inline>{(t) => t('pairing.codeLabel')}</Multilingual></figcaption>
          <output aria-label={code} data-pairing-code={code}>
            {[...code].map((char, index) => <span key={index} className="code-char">{char}</span>)}
          </output>
        </figure>
      ) : null}
      <div className="staff">
        {status?.kind === 'unreachable' ? (
          <Multilingual languages={languages}>{(t) => t('pairing.unreachable')}</Multilingual>
        ) : (
          <Multilingual languages={languages}>{(t) => <>{t('pairing.steps')} {t('pairing.renew')}</>}</Multilingual>
        )}
      </div>
    </main>
  );
}
