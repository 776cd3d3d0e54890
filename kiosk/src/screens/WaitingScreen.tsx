import { kioskLanguages } from '../app/i18n';
import type { ReleaseRefusal } from '../storage/kiosk-db';
import { Multilingual } from './Multilingual';

/**
 * Paired, but the gallery has no live release yet (or none has finished downloading). A release
 * refused for a bad file is named in small text for staff, with when it is tried again.
 */
export function WaitingScreen({ venueLocales, refusal = null }: { venueLocales: readonly string[]; refusal?: ReleaseRefusal | null }) {
  const languages = kioskLanguages(venueLocales);
  return (
    <main className="notice">
      <Multilingual languages={languages}>
        {(t, primary) => (
          <>
            {primary ? <h1>{t('notPaired.title')}</h1> : <h2>{t('notPaired.title')}</h2>}
            <p>{t('waiting.body')}</p>
          </>
        )}
      </Multilingual>
      {refusal ? (
        <div className="staff" data-refused-release={refusal.releaseId}>
          <Multilingual languages={languages}>
            {(t, _primary, language) => t('waiting.refused', {
              release: refusal.releaseId,
              time: new Intl.DateTimeFormat(language, { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(refusal.retryAt)),
            })}
          </Multilingual>
        </div>
      ) : null}
    </main>
  );
}
