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

/** Dates and times as staff read them in their language, e.g. "3 March 2026, 14:05". */
export function useDateFormat(): (iso: string) => string {
  const { i18n } = useTranslation();
  const language = i18n.resolvedLanguage ?? 'en';
  return useCallback(
    (iso) => new Intl.DateTimeFormat(language, { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(iso)),
    [language],
  );
}
