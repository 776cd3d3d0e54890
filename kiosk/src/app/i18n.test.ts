import { describe, expect, it } from 'vitest';
import { KIOSK_LANGUAGES, kioskLanguages, resources } from './i18n';

const keys = (tree: object, prefix = ''): string[] =>
  Object.entries(tree).flatMap(([key, value]) => (typeof value === 'string' ? [`${prefix}${key}`] : keys(value as object, `${prefix}${key}.`)));

describe('kiosk words', () => {
  it.each(KIOSK_LANGUAGES)('%s has exactly the English keys, none empty', (language) => {
    expect(keys(resources[language].translation).sort()).toEqual(keys(resources.en.translation).sort());
    for (const key of keys(resources[language].translation)) {
      const text = key.split('.').reduce<unknown>((node, part) => (node as Record<string, unknown>)[part], resources[language].translation);
      expect(String(text).trim(), `${language}: ${key}`).not.toBe('');
    }
  });

  it('speaks the venue languages it knows, in the venue order, once each', () => {
    expect(kioskLanguages(['fr-CA', 'en', 'es', 'fr'])).toEqual(['fr', 'en']);
  });

  it('falls back to English when it knows none of the venue languages', () => {
    expect(kioskLanguages(['ar', 'es'])).toEqual(['en']);
  });
});
