import { match } from '@formatjs/intl-localematcher';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { canonicalLanguageTag, canonicalLanguageTags, lookupFallbacks, lookupLanguage, lookupText, sameLanguageTag } from './language-tags.js';

describe('canonical language tags', () => {
  // BCP 47 (RFC 5646 §2.1.1): case carries no meaning, and the canonical form writes the region in
  // capitals and the script in title case; Intl.getCanonicalLocales (ECMA-402 §6.2.3) also replaces
  // deprecated subtags by their preferred values from the IANA registry (iw → he).
  it.each([
    ['pt-br', 'pt-BR'],
    ['EN-gb', 'en-GB'],
    ['zh-hant-tw', 'zh-Hant-TW'],
    ['iw', 'he'],
    ['sr-latn', 'sr-Latn'],
  ])('writes %s as %s', (input, canonical) => {
    expect(canonicalLanguageTag(input)).toBe(canonical);
  });

  it.each(['', 'en_GB', 'e', 'en--GB', '123', 'x'.repeat(36)])('refuses %j, which is not a BCP 47 tag', (input) => {
    expect(canonicalLanguageTag(input)).toBeNull();
  });

  it('compares tags canonically, so a translator’s pt-br is a venue’s pt-BR', () => {
    expect(sameLanguageTag('pt-br', 'pt-BR')).toBe(true);
    expect(sameLanguageTag('pt-BR', 'pt')).toBe(false);
    expect(sameLanguageTag('not a tag', 'not a tag')).toBe(false);
  });

  it('keeps each canonical tag once, in its first place', () => {
    expect(canonicalLanguageTags(['fr', 'pt-br', 'PT-BR', 'bad tag', 'en'])).toEqual(['fr', 'pt-BR', 'en']);
  });
});

describe('RFC 4647 §3.4 lookup', () => {
  // RFC 4647 §3.4's own worked example (quoted from memory of the RFC text): the range
  // zh-Hant-CN-x-private1-private2 is tried as itself, zh-Hant-CN-x-private1, zh-Hant-CN (the
  // singleton "x" goes with "private1"), zh-Hant, zh, then the default.
  it('truncates the RFC’s example range in the RFC’s order', () => {
    expect(lookupFallbacks('zh-Hant-CN-x-private1-private2')).toEqual(['zh-Hant-CN-x-private1-private2', 'zh-Hant-CN-x-private1', 'zh-Hant-CN', 'zh-Hant', 'zh']);
  });

  it('finds each step of the RFC’s example and the default when none is there', () => {
    const range = ['zh-Hant-CN-x-private1-private2'];
    expect(lookupLanguage(range, ['zh-Hant-CN-x-private1', 'zh'])).toBe('zh-Hant-CN-x-private1');
    expect(lookupLanguage(range, ['zh-Hant-CN', 'zh'])).toBe('zh-Hant-CN');
    expect(lookupLanguage(range, ['zh-Hant', 'zh'])).toBe('zh-Hant');
    expect(lookupLanguage(range, ['zh', 'en'])).toBe('zh');
    expect(lookupLanguage(range, ['en', 'fr'], 'en')).toBe('en');
    expect(lookupLanguage(range, ['en', 'fr'])).toBeUndefined();
  });

  // RFC 4647 §3.4: "if the language range is 'de-ch', a lookup operation can produce content with
  // the tags 'de' or 'de-CH' but never content with the tag 'de-CH-1996'" (from memory of the text).
  it('never widens a range: de-ch finds de-CH or de, never de-CH-1996', () => {
    expect(lookupLanguage(['de-ch'], ['de-CH-1996', 'de-CH', 'de'])).toBe('de-CH');
    expect(lookupLanguage(['de-ch'], ['de-CH-1996', 'de'])).toBe('de');
    expect(lookupLanguage(['de-ch'], ['de-CH-1996'])).toBeUndefined();
  });

  // RFC 4647 §2.3 and §3.4: the ranges are tried in the priority list's order, each truncated in
  // full before the next is tried.
  it('tries every truncation of the first wanted language before the second', () => {
    expect(lookupLanguage(['fr-CA', 'en-GB'], ['en-GB', 'fr'])).toBe('fr');
    expect(lookupLanguage(['en-GB', 'fr-CA'], ['en-GB', 'fr'])).toBe('en-GB');
  });

  it('falls back from en-GB to en, and answers with the tag as the record holds it', () => {
    expect(lookupLanguage(['en-GB'], ['fr', 'en', 'es'])).toBe('en');
    expect(lookupLanguage(['pt-BR'], ['pt-br'])).toBe('pt-br');
    expect(lookupText({ en: 'A pan of soup', fr: 'Une casserole' }, ['en-GB'])).toEqual({ tag: 'en', text: 'A pan of soup' });
    expect(lookupText({ 'en-GB': ' ', en: 'A pan of soup' }, ['en-GB'])).toEqual({ tag: 'en', text: 'A pan of soup' });
  });

  // RFC 4647 §3.4: the wildcard "*" matches nothing particular in lookup and may be ignored.
  it('skips the wildcard and malformed ranges', () => {
    expect(lookupLanguage(['*', 'bad range', 'es-MX'], ['es'])).toBe('es');
  });

  // Cross-check against a general reference implementation: formatjs's ECMA-402 LookupMatcher
  // (ECMA-402 §9.2.3, which follows RFC 4647 §3.4), on canonical tags.
  const language = fc.constantFrom('en', 'fr', 'pt', 'zh', 'de', 'sr');
  const script = fc.option(fc.constantFrom('Latn', 'Hant', 'Cyrl'), { nil: undefined });
  const region = fc.option(fc.constantFrom('GB', 'CA', 'BR', 'TW', 'CH', '419'), { nil: undefined });
  const variant = fc.option(fc.constantFrom('1996', 'valencia'), { nil: undefined });
  const tag = fc.tuple(language, script, region, variant).map((parts) => canonicalLanguageTag(parts.filter(Boolean).join('-'))!);

  it('agrees with @formatjs/intl-localematcher’s lookup on random priority lists and offers', () => {
    fc.assert(
      fc.property(fc.array(tag, { minLength: 1, maxLength: 3 }), fc.uniqueArray(tag, { maxLength: 6 }), (wanted, available) => {
        const reference = match(wanted, available, 'und', { algorithm: 'lookup' });
        expect(lookupLanguage(wanted, available, 'und')).toBe(reference);
      }),
      { numRuns: 500 },
    );
  });
});
