import { describe, expect, it } from 'vitest';
import { parseLocales } from './validation';

describe('translator locales (BCP 47, RFC 5646)', () => {
  it('accepts language, language-region and script subtags and canonicalises their case', () => {
    expect(parseLocales('fr, es-mx  zh-hant-TW')).toEqual({ locales: ['fr', 'es-MX', 'zh-Hant-TW'] });
  });

  it('reports the first tag that is not BCP 47', () => {
    expect(parseLocales('fr, french!, de').invalid).toBe('french!');
  });

  it('lists a tag once even when typed twice', () => {
    expect(parseLocales('fr FR').locales).toEqual(['fr']);
  });
});
