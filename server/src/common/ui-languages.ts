/** Languages the studio and our mail are written in. */
export const UI_LANGUAGES = ['en', 'fr', 'es', 'ar'] as const;
export type UiLanguage = (typeof UI_LANGUAGES)[number];

export const asUiLanguage = (value: string): UiLanguage =>
  (UI_LANGUAGES as readonly string[]).includes(value) ? (value as UiLanguage) : 'en';

/** BCP 47 language tag, e.g. fr, es, pt-BR, zh-Hant. */
export const BCP47 = /^[a-zA-Z]{2,3}(-[a-zA-Z0-9]{2,8})*$/;
