import { describe, expect, it } from 'vitest';
import { translationGaps } from '@mantlepiece/shared';
import { workbenchStrings } from '../../routes/widgets/workbench-strings';
import { i18next, resources } from './index';
import { languageDirection, matchUiLanguage, UI_LANGUAGES } from '@mantlepiece/shared';

const codes = UI_LANGUAGES.map((language) => language.code);
const complete = { missing: [], extra: [], empty: [], placeholders: [] };

describe('studio UI strings', () => {
  it('come in English, French, Spanish and Arabic, one resource for each language in the menu', () => {
    expect([...codes].sort()).toEqual(['ar', 'en', 'es', 'fr']);
    expect(Object.keys(resources).sort()).toEqual([...codes].sort());
  });

  // Plural forms are those Intl.PluralRules reaches for counts 0–1000 (CLDR: Arabic needs all six).
  it.each(codes)('%s has every English key, every plural form its grammar needs, no empty string, the same {{placeholders}}', (code) => {
    expect(translationGaps(resources.en.translation, resources[code].translation, code)).toEqual(complete);
  });

  it.each(codes)('%s has the widget workbench’s words too', (code) => {
    expect(translationGaps(workbenchStrings('en'), workbenchStrings(code), code)).toEqual(complete);
  });

  it('names each language in itself and sets Arabic right to left', () => {
    expect(UI_LANGUAGES.map((language) => language.name)).toEqual(['English', 'Français', 'Español', 'العربية']);
    expect(codes.filter((code) => languageDirection(code) === 'rtl')).toEqual(['ar']);
    expect(matchUiLanguage(['ar-EG'])).toBe('ar');
    expect(matchUiLanguage(['es-419'])).toBe('es');
  });

  it('picks the Arabic plural form by count, as CLDR defines them', () => {
    const t = i18next.getFixedT('ar');
    expect([0, 1, 2, 3, 11, 100].map((count) => t('reviews.blockers', { count }))).toEqual([
      'لا عوائق', 'عائق واحد', 'عائقان', '3 عوائق', '11 عائقًا', '100 عائق',
    ]);
  });

  it('moves the document to right to left when the studio switches to Arabic, and back', async () => {
    await i18next.changeLanguage('ar');
    expect([document.documentElement.lang, document.documentElement.dir]).toEqual(['ar', 'rtl']);
    await i18next.changeLanguage('en');
    expect([document.documentElement.lang, document.documentElement.dir]).toEqual(['en', 'ltr']);
  });
});
