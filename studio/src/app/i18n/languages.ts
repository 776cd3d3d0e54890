/**
 * The languages the studio's own screens come in. Adding Spanish or Arabic means a locale file
 * and one entry here; `dir` already lets a right-to-left language flip the layout.
 */
export const UI_LANGUAGES = [
  { code: 'en', name: 'English', dir: 'ltr' },
  { code: 'fr', name: 'Français', dir: 'ltr' },
] as const satisfies readonly { code: string; name: string; dir: 'ltr' | 'rtl' }[];

export type UiLanguage = (typeof UI_LANGUAGES)[number]['code'];

export const DEFAULT_UI_LANGUAGE: UiLanguage = 'en';

/** The first candidate (a BCP 47 tag such as "fr-CA") whose language the studio speaks. */
export function matchUiLanguage(candidates: readonly (string | null | undefined)[]): UiLanguage | undefined {
  for (const candidate of candidates) {
    const base = candidate?.toLowerCase().split('-')[0];
    const match = UI_LANGUAGES.find((language) => language.code === base);
    if (match) return match.code;
  }
  return undefined;
}

export const languageDirection = (code: string) => UI_LANGUAGES.find((language) => language.code === code)?.dir ?? 'ltr';
