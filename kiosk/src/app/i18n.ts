import i18next from 'i18next';
import { initReactI18next } from 'react-i18next';
import { matchUiLanguage, UI_LANGUAGE_CODES, type Translated, type UiLanguage } from '@mantlepiece/shared/kiosk';
import { ar } from './locales/ar';
import { en, type KioskMessages } from './locales/en';
import { es } from './locales/es';
import { fr } from './locales/fr';

/** The kiosk's own words come in our UI languages; a venue's other languages fall back to English. */
export const KIOSK_LANGUAGES = UI_LANGUAGE_CODES;
export type KioskLanguage = UiLanguage;

export const resources = {
  en: { translation: en },
  fr: { translation: fr },
  es: { translation: es },
  ar: { translation: ar },
} satisfies Record<KioskLanguage, { translation: Translated<KioskMessages> }>;

declare module 'i18next' {
  interface CustomTypeOptions {
    resources: { translation: KioskMessages };
  }
}

/** The venue's languages the kiosk can speak (each by RFC 4647 lookup, fr-CA → fr), in the venue's order; English when none match. */
export function kioskLanguages(venueLocales: readonly string[]): KioskLanguage[] {
  const matches = venueLocales.flatMap((tag) => matchUiLanguage([tag]) ?? []);
  return matches.length ? [...new Set(matches)] : ['en'];
}

/** The language the kiosk's own words (buttons, warnings) take beside content in `locale`. */
export function chromeLanguage(locale: string): KioskLanguage {
  return kioskLanguages([locale])[0]!;
}

void i18next.use(initReactI18next).init({
  resources,
  lng: 'en',
  fallbackLng: 'en',
  interpolation: { escapeValue: false },
  initAsync: false,
});

export { i18next };
