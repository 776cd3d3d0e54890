import { describe, expect, it } from 'vitest';
import { WIDGET_LOCALES } from '../i18n/index.js';
import { modelCardIn } from './model-card.js';
import { WIDGET_TYPES, widgetRegistry } from './registry.js';

describe.each(WIDGET_TYPES)('the model card of %s', (type) => {
  const card = widgetRegistry[type].model;

  it('names published sources, each with a citation and, where it has one, a DOI', () => {
    expect(card.sources.length).toBeGreaterThan(0);
    for (const source of card.sources) {
      expect(source.citation).toMatch(/\(\d{4}\)/);
      if (source.doi !== undefined) expect(source.doi).toMatch(/^10\.\d{4,9}\/\S+$/);
    }
  });

  it.each(WIDGET_LOCALES)('says in %s what each equation is, what the model assumes and where it holds', (locale) => {
    const words = card.words[locale];
    expect(words.summary.trim()).not.toBe('');
    expect(words.equations).toHaveLength(card.equations.length);
    expect(words.assumptions.length).toBeGreaterThan(0);
    expect(words.range.length).toBeGreaterThan(0);
    for (const text of [...words.equations, ...words.assumptions, ...words.range]) expect(text.trim()).not.toBe('');
  });

  it('reads in the language asked for, and in English for one it lacks', () => {
    expect(modelCardIn(card, 'fr-CA').summary).toBe(card.words.fr.summary);
    expect(modelCardIn(card, 'sw').equations.map((equation) => equation.meaning)).toEqual(card.words.en.equations);
  });
});
