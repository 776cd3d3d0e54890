import i18next from 'i18next';
import { initReactI18next } from 'react-i18next';
import { DEFAULT_UI_LANGUAGE, languageDirection, matchUiLanguage, type Translated, type UiLanguage } from '@mantlepiece/shared';
import { ar } from './locales/ar';
import { en } from './locales/en';
import { es } from './locales/es';
import { fr } from './locales/fr';

export const resources = {
  en: { translation: en },
  fr: { translation: fr },
  es: { translation: es },
  ar: { translation: ar },
} satisfies Record<UiLanguage, { translation: Translated<typeof en> }>;

declare module 'i18next' {
  interface CustomTypeOptions {
    resources: { translation: typeof en };
  }
}

const STORAGE_KEY = 'mantlepiece.uiLanguage';

function storedLanguage(): string | null {
  try {
    return localStorage.getItem(STORAGE_KEY);
  } catch {
    return null;
  }
}

i18next.on('languageChanged', (language) => {
  document.documentElement.lang = language;
  document.documentElement.dir = languageDirection(language);
  try {
    localStorage.setItem(STORAGE_KEY, language);
  } catch {
    // Private browsing may refuse storage; the choice then lasts until the tab closes.
  }
});

void i18next.use(initReactI18next).init({
  resources,
  lng: matchUiLanguage([storedLanguage(), ...navigator.languages]) ?? DEFAULT_UI_LANGUAGE,
  fallbackLng: DEFAULT_UI_LANGUAGE,
  interpolation: { escapeValue: false },
  initAsync: false,
});

export { i18next };
