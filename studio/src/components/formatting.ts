import { useCallback, useMemo } from 'react';
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

const DATE_AND_TIME: Intl.DateTimeFormatOptions = { dateStyle: 'medium', timeStyle: 'short' };
/** A calendar day is read at UTC midnight, so the browser's zone cannot move it to the day before. */
const DAY: Intl.DateTimeFormatOptions = { dateStyle: 'medium', timeZone: 'UTC' };

function useRegionalFormat(options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const { i18n } = useTranslation();
  const locale = regionalLocale(i18n.resolvedLanguage ?? 'en');
  return useMemo(() => new Intl.DateTimeFormat(locale, options), [locale, options]);
}

/** Dates and times as staff read them in their language and region. */
export function useDateFormat(): (iso: string) => string {
  const format = useRegionalFormat(DATE_AND_TIME);
  return useCallback((iso) => format.format(new Date(iso)), [format]);
}

/** A calendar day (YYYY-MM-DD, such as a licence's last day) as staff read it, without a time. */
export function useDayFormat(): (day: string) => string {
  const format = useRegionalFormat(DAY);
  return useCallback((day) => format.format(new Date(`${day}T00:00:00Z`)), [format]);
}
