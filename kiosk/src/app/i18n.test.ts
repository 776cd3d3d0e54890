import { describe, expect, it } from 'vitest';
import { translationGaps } from '@mantlepiece/shared/kiosk';
import { chromeLanguage, KIOSK_LANGUAGES, kioskLanguages, resources } from './i18n';

describe('kiosk words', () => {
  it('come in English, French, Spanish and Arabic', () => {
    expect([...KIOSK_LANGUAGES].sort()).toEqual(['ar', 'en', 'es', 'fr']);
  });

  // Plural forms are those Intl.PluralRules reaches for counts 0–1000 (CLDR: all six in Arabic).
  it.each(KIOSK_LANGUAGES)('%s has every English key, every plural form its grammar needs, none empty', (language) => {
    expect(translationGaps(resources.en.translation, resources[language].translation, language)).toEqual({ missing: [], extra: [], empty: [], placeholders: [] });
  });

  it('speaks the venue languages it knows, in the venue order, once each', () => {
    expect(kioskLanguages(['fr-CA', 'en', 'ar-EG', 'es', 'fr'])).toEqual(['fr', 'en', 'ar', 'es']);
  });

  it('falls back to English when it knows none of the venue languages', () => {
    expect(kioskLanguages(['de', 'sw'])).toEqual(['en']);
  });

  it('words its own buttons in Arabic beside Arabic content', () => {
    expect(chromeLanguage('ar-MA')).toBe('ar');
  });
});
