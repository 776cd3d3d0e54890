import { useCallback } from 'react';
import { useTranslation } from 'react-i18next';

/** A locale's name in the studio's current language ("French", "français", "الفرنسية"); the tag itself when Intl has none. */
export function useLanguageName(): (locale: string) => string {
  const { i18n } = useTranslation();
  const language = i18n.resolvedLanguage ?? 'en';
  return useCallback(
    (locale: string) => {
      try {
        return new Intl.DisplayNames([language], { type: 'language' }).of(locale) ?? locale;
      } catch {
        return locale;
      }
    },
    [language],
  );
}
