import { describe, expect, it } from 'vitest';
import { resources } from './index';
import { UI_LANGUAGES } from './languages';

type Tree = { [key: string]: string | Tree };

/** Every leaf of a resource tree as "a.b.c" → text. */
function leaves(tree: Tree, prefix = ''): Map<string, string> {
  const found = new Map<string, string>();
  for (const [key, value] of Object.entries(tree)) {
    const path = prefix ? `${prefix}.${key}` : key;
    if (typeof value === 'string') found.set(path, value);
    else for (const [childPath, text] of leaves(value, path)) found.set(childPath, text);
  }
  return found;
}

const placeholders = (text: string) => [...text.matchAll(/\{\{\s*(\w+)/g)].map((match) => match[1]).sort();

const reference = leaves(resources.en.translation);

describe('studio UI strings', () => {
  it('has a resource for every language in the language menu', () => {
    expect(Object.keys(resources).sort()).toEqual(UI_LANGUAGES.map((language) => language.code).sort());
  });

  describe.each(UI_LANGUAGES.map((language) => language.code))('%s', (code) => {
    const strings = leaves(resources[code].translation);

    it('has every English key and no key English lacks', () => {
      expect([...reference.keys()].filter((key) => !strings.has(key)), 'missing keys').toEqual([]);
      expect([...strings.keys()].filter((key) => !reference.has(key)), 'extra keys').toEqual([]);
    });

    it('leaves no string empty and keeps the same {{placeholders}} as English', () => {
      for (const [key, english] of reference) {
        const text = strings.get(key) ?? '';
        expect(text.trim(), `${code}: ${key} is empty`).not.toBe('');
        expect(placeholders(text), `${code}: placeholders of ${key}`).toEqual(placeholders(english));
      }
    });
  });
});
