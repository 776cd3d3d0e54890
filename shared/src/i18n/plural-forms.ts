/** Plural categories some languages need beyond English's "one" and "other" (CLDR; Arabic uses all six). */
export type ExtraPluralCategory = 'zero' | 'two' | 'few' | 'many';

/**
 * A language's strings shaped like the English ones, with room for the extra plural forms of its
 * grammar (`files_few` beside `files_one`), which i18next picks by Intl.PluralRules.
 */
export type Translated<T> = { [K in keyof T]: T[K] extends string ? string : Translated<T[K]> } & {
  [key: `${string}_${ExtraPluralCategory}`]: string;
};

type Tree = { readonly [key: string]: string | Tree };

const PLURAL_SUFFIX = /_(zero|one|two|few|many|other)$/;

/** Every leaf of a resource tree as "a.b.c" → text. */
export function resourceLeaves(tree: object, prefix = ''): Map<string, string> {
  const found = new Map<string, string>();
  for (const [key, value] of Object.entries(tree as Tree)) {
    const path = prefix ? `${prefix}.${key}` : key;
    if (typeof value === 'string') found.set(path, value);
    else for (const [childPath, text] of resourceLeaves(value, path)) found.set(childPath, text);
  }
  return found;
}

/** The plural categories a language's grammar reaches for whole counts 0 to `upTo`. */
export function pluralCategoriesReached(language: string, upTo = 1000): Intl.LDMLPluralRule[] {
  const rules = new Intl.PluralRules(language);
  const reached = new Set<Intl.LDMLPluralRule>();
  for (let count = 0; count <= upTo; count += 1) reached.add(rules.select(count));
  return [...reached];
}

const placeholdersOf = (text: string) => [...text.matchAll(/\{\{\s*(\w+)/g)].map((match) => match[1]!).sort();

/** How one language's strings fall short of the English reference; every list empty means complete. */
export interface TranslationGaps {
  missing: string[];
  extra: string[];
  empty: string[];
  /** Keys whose {{placeholders}} differ from English (a zero, one or two form may leave out {{count}}). */
  placeholders: string[];
}

/**
 * Compares a language's resources with English: every English key present, no other key except a
 * plural form of an English plural key, and every plural form the language's grammar reaches
 * (by Intl.PluralRules; i18next falls back from `key_other` to the bare `key`).
 */
export function translationGaps(reference: object, translated: object, language: string): TranslationGaps {
  const english = resourceLeaves(reference);
  const strings = resourceLeaves(translated);
  const pluralBases = new Map<string, string>();
  for (const [key, text] of english) {
    const base = key.replace(PLURAL_SUFFIX, '');
    if (base !== key) pluralBases.set(base, text);
  }
  const categories = pluralCategoriesReached(language);
  const required = new Set([...english.keys()].filter((key) => !pluralBases.has(key.replace(PLURAL_SUFFIX, ''))));
  const missing = [...required].filter((key) => !strings.has(key));
  for (const base of pluralBases.keys()) {
    for (const category of categories) {
      const found = strings.has(`${base}_${category}`) || (category === 'other' && strings.has(base));
      if (!found) missing.push(`${base}_${category}`);
    }
  }
  const extra = [...strings.keys()].filter((key) => {
    if (required.has(key)) return false;
    const base = key.replace(PLURAL_SUFFIX, '');
    const category = key.slice(base.length + 1) as Intl.LDMLPluralRule;
    return !(pluralBases.has(base) && (key === base || categories.includes(category)));
  });
  const empty = [...strings].filter(([, text]) => text.trim() === '').map(([key]) => key);
  const placeholders = [...strings].filter(([key, text]) => {
    const base = key.replace(PLURAL_SUFFIX, '');
    const source = english.get(key) ?? pluralBases.get(base) ?? english.get(base);
    if (source === undefined) return false;
    const expected = placeholdersOf(source);
    const found = placeholdersOf(text);
    const mayDropCount = /_(zero|one|two)$/.test(key) && expected.includes('count');
    const same = (list: string[]) => list.length === found.length && list.every((name, i) => name === found[i]);
    return !(same(expected) || (mayDropCount && same(expected.filter((name) => name !== 'count'))));
  }).map(([key]) => key);
  return { missing, extra, empty, placeholders };
}
