import { kioskLanguages } from '../app/i18n';
import { Multilingual } from './Multilingual';

/** Paired, but the gallery has no live release yet (or none has finished downloading). */
export function WaitingScreen({ venueLocales }: { venueLocales: readonly string[] }) {
  return (
    <main className="notice">
      <Multilingual languages={kioskLanguages(venueLocales)}>
        {(t, primary) => (
          <>
            {primary ? <h1>{t('notPaired.title')}</h1> : <h2>{t('notPaired.title')}</h2>}
            <p>{t('waiting.body')}</p>
          </>
        )}
      </Multilingual>
    </main>
  );
}
