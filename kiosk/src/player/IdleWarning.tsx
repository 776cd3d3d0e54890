import type { TFunction } from 'i18next';

/** "Still there?", with the seconds left and a large button that keeps the visit going. */
export function IdleWarning({ t, secondsLeft, onStay }: { t: TFunction; secondsLeft: number; onStay: () => void }) {
  return (
    <div className="idle-backdrop">
      <div role="alertdialog" aria-modal="true" aria-labelledby="idle-title" aria-describedby="idle-body" className="idle-warning">
        <h2 id="idle-title">{t('idle.title')}</h2>
        <p id="idle-body" aria-live="polite">{t('idle.body', { count: secondsLeft })}</p>
        <button type="button" className="big-button" onClick={onStay} autoFocus>{t('idle.stay')}</button>
      </div>
    </div>
  );
}
