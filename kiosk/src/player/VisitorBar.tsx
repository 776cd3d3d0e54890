import { useReducedMotion } from '@mantlepiece/shared/kiosk';
import type { TFunction } from 'i18next';
import type { KioskSwitch } from '@mantlepiece/shared/kiosk';
import { endonym } from './language-names';
import { SWITCH_SETTING, type VisitorSettings } from './visitor-settings';

const SWITCH_LABELS = { large_text: 'settings.largeText', high_contrast: 'settings.highContrast', reduced_motion: 'settings.reducedMotion' } as const;

/** Languages by their own names, and the accessibility switches, always in reach on a story. */
export function VisitorBar({ t, locales, settings, onLocale, onSwitch }: {
  t: TFunction;
  locales: readonly string[];
  settings: VisitorSettings;
  onLocale: (locale: string) => void;
  onSwitch: (name: KioskSwitch, on: boolean) => void;
}) {
  const reducedMotion = useReducedMotion(settings.reducedMotion);
  const isOn = (name: KioskSwitch) => (name === 'reduced_motion' ? reducedMotion : settings[SWITCH_SETTING[name]] === true);
  return (
    <div className="visitor-bar">
      {locales.length > 1 ? (
        <div role="group" aria-label={t('settings.language')} className="languages">
          {locales.map((locale) => (
            <button key={locale} type="button" className="chip" lang={locale} aria-pressed={settings.locale === locale} onClick={() => onLocale(locale)}>
              {endonym(locale)}
            </button>
          ))}
        </div>
      ) : null}
      <div className="switches">
        {(Object.keys(SWITCH_LABELS) as KioskSwitch[]).map((name) => (
          <button key={name} type="button" role="switch" className="chip switch" aria-checked={isOn(name)} onClick={() => onSwitch(name, !isOn(name))}>
            <span className="switch-mark" aria-hidden="true" />
            {t(SWITCH_LABELS[name])}
          </button>
        ))}
      </div>
    </div>
  );
}
