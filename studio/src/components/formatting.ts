import { useCallback } from 'react';
import { useTranslation } from 'react-i18next';
import type { Role } from '@mantlepiece/shared';

/** "Curator and Translator", in the studio's current language. */
export function useRoleList(): (roles: readonly Role[]) => string {
  const { t, i18n } = useTranslation();
  const language = i18n.resolvedLanguage ?? 'en';
  return useCallback(
    (roles) => new Intl.ListFormat(language, { type: 'conjunction' }).format(roles.map((role) => t(`roles.${role}`))),
    [language, t],
  );
}

/**
 * The browser's own regional variant of the studio's language when it has one (en-GB, fr-CA),
 * so dates follow local habit: "1 Dec 2026, 19:19" in Britain, "Dec 1, 2026, 7:19 PM" in the US.
 */
function regionalLocale(language: string): string {
  return navigator.languages.find((tag) => tag.toLowerCase().split('-')[0] === language) ?? language;
}

/** Dates and times as staff read them in their language and region. */
export function useDateFormat(): (iso: string) => string {
  const { i18n } = useTranslation();
  const locale = regionalLocale(i18n.resolvedLanguage ?? 'en');
  return useCallback(
    (iso) => new Intl.DateTimeFormat(locale, { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(iso)),
    [locale],
  );
}
