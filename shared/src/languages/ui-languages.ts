import { lookupLanguage } from './language-tags.js';

/**
 * The languages the studio, the kiosk's own words and our mail come in, each named in itself.
 * Adding one means locale files in each app and one entry here; `dir` flips a whole layout for a
 * right-to-left language.
 */
export const UI_LANGUAGES = [
  { code: 'en', name: 'English', dir: 'ltr' },
  { code: 'fr', name: 'Français', dir: 'ltr' },
  { code: 'es', name: 'Español', dir: 'ltr' },
  { code: 'ar', name: 'العربية', dir: 'rtl' },
] as const satisfies readonly { code: string; name: string; dir: 'ltr' | 'rtl' }[];

export type UiLanguage = (typeof UI_LANGUAGES)[number]['code'];

export const UI_LANGUAGE_CODES: readonly UiLanguage[] = UI_LANGUAGES.map((language) => language.code);

export const DEFAULT_UI_LANGUAGE: UiLanguage = 'en';

/** The UI language the candidates (BCP 47 tags such as "fr-CA", best first) find by RFC 4647 lookup. */
export const matchUiLanguage = (candidates: readonly (string | null | undefined)[]): UiLanguage | undefined =>
  lookupLanguage(candidates, UI_LANGUAGE_CODES) as UiLanguage | undefined;

/** A stored or requested language as one we speak, English when we do not (or none is given). */
export const asUiLanguage = (tag: string | null | undefined): UiLanguage => matchUiLanguage([tag]) ?? DEFAULT_UI_LANGUAGE;

export const languageDirection = (code: string): 'ltr' | 'rtl' => UI_LANGUAGES.find((language) => language.code === code)?.dir ?? 'ltr';
