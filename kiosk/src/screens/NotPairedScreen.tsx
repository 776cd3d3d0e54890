import { useEffect } from 'react';
import type { KioskLanguage } from '../app/i18n';
import { Multilingual } from './Multilingual';

// A visitor who walks away leaves the screen ready for the next one.
export const IDLE_RETURN_MS = 60_000;

/** What a touch leads to until the kiosk is paired with a station: said plainly, in every language. */
export function NotPairedScreen({ languages, onBack }: { languages: readonly KioskLanguage[]; onBack: () => void }) {
  useEffect(() => {
    const timer = setTimeout(onBack, IDLE_RETURN_MS);
    return () => clearTimeout(timer);
  }, [onBack]);

  return (
    <main className="notice">
      <Multilingual languages={languages}>
        {(t, primary) => (
          <>
            {primary ? <h1>{t('notPaired.title')}</h1> : <h2>{t('notPaired.title')}</h2>}
            <p>{t('notPaired.body')}</p>
          </>
        )}
      </Multilingual>
      <button type="button" className="back" onClick={onBack}>
        <Multilingual languages={languages} inline>{(t) => t('notPaired.back')}</Multilingual>
      </button>
      <div className="staff">
        <Multilingual languages={languages}>{(t) => t('notPaired.staff')}</Multilingual>
      </div>
    </main>
  );
}
