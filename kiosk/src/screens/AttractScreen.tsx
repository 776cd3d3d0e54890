import type { KioskLanguage } from '../app/i18n';
import { Multilingual } from './Multilingual';

/** The attract loop before pairing: the venue's name and one touch target that fills the screen. */
export function AttractScreen({ venueName, languages, onTouch }: { venueName: string; languages: readonly KioskLanguage[]; onTouch: () => void }) {
  return (
    <button type="button" className="attract" onClick={onTouch}>
      <span className="strata" aria-hidden="true" />
      <span className="venue">{venueName}</span>
      <span className="touch">
        <span className="touch-ring" aria-hidden="true" />
        <span className="touch-text">
          <Multilingual languages={languages} inline>{(t) => t('attract.touch')}</Multilingual>
        </span>
      </span>
    </button>
  );
}
