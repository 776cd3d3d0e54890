import { KIOSK_LANGUAGES } from '../app/i18n';
import { Multilingual } from './Multilingual';

/** No venue yet because the server is out of reach: the kiosk says so and keeps trying. */
export function OfflineScreen() {
  return (
    <main className="notice">
      <Multilingual languages={KIOSK_LANGUAGES}>
        {(t, primary) => (
          <>
            {primary ? <h1>{t('offline.title')}</h1> : <h2>{t('offline.title')}</h2>}
            <p>{t('offline.body')}</p>
          </>
        )}
      </Multilingual>
    </main>
  );
}
