import { describe, expect, it } from 'vitest';
import { COMMON_LANGUAGE_TAGS, languageOptions, searchLanguages } from './language-options';

const tags = (options: { tag: string }[]) => options.map((option) => option.tag);

describe('language options', () => {
  it('lists common languages in canonical BCP 47 form (Intl.getCanonicalLocales), each once', () => {
    expect(COMMON_LANGUAGE_TAGS.every((tag) => Intl.getCanonicalLocales(tag)[0] === tag)).toBe(true);
    expect(new Set(COMMON_LANGUAGE_TAGS).size).toBe(COMMON_LANGUAGE_TAGS.length);
  });

  it('names each in the studio’s language by Intl.DisplayNames and sorts by that name', () => {
    const options = languageOptions('fr');
    // CLDR's French name for de, as Intl.DisplayNames gives it.
    expect(options.find((option) => option.tag === 'de')?.name).toBe(new Intl.DisplayNames(['fr'], { type: 'language' }).of('de'));
    const names = options.map((option) => option.name);
    expect(names).toEqual([...names].sort(new Intl.Collator('fr').compare));
  });

  it('adds the tags already in use, canonical, even one Intl cannot name', () => {
    const options = languageOptions('en', ['oc', 'pt-br', 'qaa']);
    expect(tags(options)).toEqual(expect.arrayContaining(['oc', 'pt-BR', 'qaa']));
    expect(options.find((option) => option.tag === 'qaa')?.name).toBe('qaa');
  });

  it('finds a language by its name in the studio’s language, by its own name without accents, and by tag', () => {
    const options = languageOptions('en');
    expect(tags(searchLanguages(options, 'portug', 'en'))).toEqual(expect.arrayContaining(['pt', 'pt-BR', 'pt-PT']));
    expect(tags(searchLanguages(options, 'francais', 'en'))).toContain('fr');
    expect(tags(searchLanguages(options, 'EN-g', 'en'))).toEqual(['en-GB']);
  });

  it('offers a well-formed tag that is not on the list once typed in full, and nothing for gibberish', () => {
    const options = languageOptions('en');
    expect(tags(searchLanguages(options, 'oc', 'en'))[0]).toBe('oc');
    expect(searchLanguages(options, 'zzzzqq', 'en')).toEqual([]);
  });
});
