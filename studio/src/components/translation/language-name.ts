import { useCallback } from 'react';
import { useTranslation } from 'react-i18next';

/**
 * A locale's name in the studio's current language ("French", "français", "الفرنسية"); the tag
 * itself when Intl has none. `standalone` starts it with a capital for a label on its own (a table
 * cell, a tab, a menu entry), where French and Spanish names would otherwise start in lower case.
 */
export function useLanguageName({ standalone = false }: { standalone?: boolean } = {}): (locale: string) => string {
  const { i18n } = useTranslation();
  const language = i18n.resolvedLanguage ?? 'en';
  return useCallback(
    (locale: string) => {
      let name: string;
      try {
        name = new Intl.DisplayNames([language], { type: 'language' }).of(locale) ?? locale;
      } catch {
        return locale;
      }
      return standalone ? name.charAt(0).toLocaleUpperCase(language) + name.slice(1) : name;
    },
    [language, standalone],
  );
}
