import { describe, expect, it } from 'vitest';
import { pluralCategoriesReached, translationGaps } from './plural-forms.js';

const english = { menu: { title: 'Choose a story', panels_one: '{{count}} screen', panels_other: '{{count}} screens' }, hint: 'Hello {{name}}' };

describe('plural categories and translation gaps', () => {
  // CLDR plural rules: Arabic has zero, one, two, few (3–10), many (11–99) and other (100–102, …).
  it('finds the six Arabic categories and only one and other for English and Spanish up to 1000', () => {
    expect(pluralCategoriesReached('ar').sort()).toEqual(['few', 'many', 'one', 'other', 'two', 'zero']);
    expect(pluralCategoriesReached('en').sort()).toEqual(['one', 'other']);
    expect(pluralCategoriesReached('es').sort()).toEqual(['one', 'other']);
  });

  it('asks Arabic for every form its grammar reaches and accepts the bare key as "other"', () => {
    const arabic = { menu: { title: 'اختر قصة', panels_one: 'شاشة واحدة', panels_two: 'شاشتان', panels_few: '{{count}} شاشات' }, hint: 'مرحبًا {{name}}' };
    expect(translationGaps(english, arabic, 'ar').missing.sort()).toEqual(['menu.panels_many', 'menu.panels_other', 'menu.panels_zero']);
    const complete = { ...arabic, menu: { ...arabic.menu, panels_zero: 'لا شاشات', panels_many: '{{count}} شاشة', panels: '{{count}} شاشة' } };
    expect(translationGaps(english, complete, 'ar')).toEqual({ missing: [], extra: [], empty: [], placeholders: [] });
  });

  it('reports keys English lacks, empty strings and changed placeholders', () => {
    const spanish = { menu: { title: ' ', panels_one: '{{count}} pantalla', panels_other: '{{número}} pantallas', panels_few: '{{count}} x' }, hint: 'Hola', extra: 'y' };
    expect(translationGaps(english, spanish, 'es')).toEqual({
      missing: [],
      extra: ['menu.panels_few', 'extra'],
      empty: ['menu.title'],
      placeholders: ['menu.panels_other', 'hint'],
    });
  });
});
