import { describe, expect, it } from 'vitest';
import { resolveWidgetLocale, WIDGET_LOCALES, widgetResources, widgetStrings } from './index.js';

type Tree = { [key: string]: string | Tree };

const leaves = (tree: Tree, prefix = ''): [string, string][] =>
  Object.entries(tree).flatMap(([key, value]) => (typeof value === 'string' ? [[`${prefix}${key}`, value] as [string, string]] : leaves(value, `${prefix}${key}.`)));

const placeholders = (text: string) => [...text.matchAll(/\{\{\s*(\w+)/g)].map((match) => match[1]).sort();

const english = new Map(leaves(widgetResources.en.widgets as unknown as Tree));

describe('widget strings', () => {
  it('come in English, French, Spanish and Arabic', () => {
    expect([...WIDGET_LOCALES].sort()).toEqual(['ar', 'en', 'es', 'fr']);
  });

  describe.each(WIDGET_LOCALES)('%s', (locale) => {
    const strings = new Map(leaves(widgetResources[locale].widgets as unknown as Tree));

    it('has exactly the English keys', () => {
      expect([...strings.keys()].sort()).toEqual([...english.keys()].sort());
    });

    it('leaves no string empty and keeps the English {{placeholders}}', () => {
      for (const [key, text] of strings) {
        expect(text.trim(), `${locale}: ${key} is empty`).not.toBe('');
        expect(placeholders(text), `${locale}: placeholders of ${key}`).toEqual(placeholders(english.get(key) ?? ''));
      }
    });
  });

  it('picks a language for a regional tag and English for one it lacks', () => {
    expect(resolveWidgetLocale('es-419')).toBe('es');
    expect(resolveWidgetLocale('ar-EG')).toBe('ar');
    expect(widgetStrings('sw')).toBe(widgetResources.en.widgets);
  });
});
