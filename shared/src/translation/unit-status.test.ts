import { describe, expect, it } from 'vitest';
import { examplePanelDoc } from '../panel/example-panel.js';
import type { PanelNodeJSON } from '../panel/panel-json.js';
import { lengthBudget } from './length-budget.js';
import { segmentPanel } from './segment-panel.js';
import { carryTranslations, localeCompleteness, unitStatus } from './unit-status.js';

const options = { panelId: 42, sourceLocale: 'en' };

describe('unitStatus', () => {
  it('is untranslated, translated or stale by the source hash the translation was made from', () => {
    expect(unitStatus({ sourceHash: 'a' })).toBe('untranslated');
    expect(unitStatus({ sourceHash: 'a', translation: { sourceHash: 'a', text: '' } })).toBe('untranslated');
    expect(unitStatus({ sourceHash: 'a', translation: { sourceHash: 'a', text: 'Essayez' } })).toBe('translated');
    expect(unitStatus({ sourceHash: 'b', translation: { sourceHash: 'a', text: 'Essayez' } })).toBe('stale');
  });

  it('marks a translation stale after the curator edits its source, and only that one', async () => {
    const before = await segmentPanel(examplePanelDoc(), options);
    const translations = Object.fromEntries(before.map((unit) => [unit.id, { sourceHash: unit.sourceHash, text: `fr: ${unit.display}` }]));
    const edited = examplePanelDoc();
    (edited.content as PanelNodeJSON[])[3]!.content = [{ type: 'text', text: 'Try it yourself' }];
    const after = await segmentPanel(edited, options);
    expect(after.map((unit) => [unit.id, unitStatus({ sourceHash: unit.sourceHash, translation: translations[unit.id] })])).toEqual([
      ['p42.heading.1', 'translated'],
      ['p42.paragraph.1', 'translated'],
      ['p42.heading.2', 'stale'],
      ['p42.listItem.1', 'translated'],
      ['p42.listItem.2', 'translated'],
      ['p42.listItem.3', 'translated'],
      ['p42.quote.1', 'translated'],
    ]);
    expect(localeCompleteness('fr', after, translations)).toEqual({ locale: 'fr', total: 7, translated: 6, stale: 1 });
    expect(localeCompleteness('es', after, {})).toEqual({ locale: 'es', total: 7, translated: 0, stale: 0 });
  });
});

describe('carryTranslations', () => {
  it('follows list items renumbered by an insertion above them; the new item starts untranslated', async () => {
    const before = await segmentPanel(examplePanelDoc(), options);
    const translations = Object.fromEntries(before.map((unit) => [unit.id, { sourceHash: unit.sourceHash, text: `fr: ${unit.display}` }]));
    const edited = examplePanelDoc();
    const list = (edited.content as PanelNodeJSON[])[4]!.content as PanelNodeJSON[];
    list.unshift({ type: 'listItem', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Find the ridge.' }] }] });
    const after = await segmentPanel(edited, options);
    const carried = carryTranslations(after, translations);
    expect(after.map((unit) => [unit.id, unit.display, carried[unit.id]?.text ?? null, unitStatus({ sourceHash: unit.sourceHash, translation: carried[unit.id] })]).slice(3)).toEqual([
      ['p42.listItem.1', 'Find the ridge.', null, 'untranslated'],
      ['p42.listItem.2', 'Tilt the slope.', 'fr: Tilt the slope.', 'translated'],
      ['p42.listItem.3', 'Watch the block.', 'fr: Watch the block.', 'translated'],
      ['p42.listItem.4', 'Ask a guide.', 'fr: Ask a guide.', 'translated'],
      ['p42.quote.1', 'Rock holds until it does not.', 'fr: Rock holds until it does not.', 'translated'],
    ]);
  });
});

describe('lengthBudget', () => {
  // Expansion factors and the short-text allowance are common practice, from memory (see length-budget.ts).
  it('scales the source length to the target language family, with room for short texts and a floor', async () => {
    const [heading, paragraph, tryIt] = await segmentPanel(examplePanelDoc(), options);
    expect(lengthBudget(paragraph!, { targetLocale: 'fr' })).toBe(Math.ceil(paragraph!.sourceLength * 1.25 * 1.05));
    expect(lengthBudget(paragraph!, { targetLocale: 'de-CH' })).toBe(Math.ceil(paragraph!.sourceLength * 1.3 * 1.05));
    expect(lengthBudget(paragraph!, { targetLocale: 'ja' })).toBeLessThan(paragraph!.sourceLength);
    expect(lengthBudget(tryIt!, { targetLocale: 'fr' })).toBe(12);
    expect(lengthBudget(heading!, { targetLocale: 'fr' })).toBe(Math.ceil(20 * 1.25 * 1.4));
  });

  it('holds a heading to two lines of the layout, but never below its own source length', async () => {
    const long = 'How the hot rock deep under the ocean floor slowly rises and sinks again';
    const [heading] = await segmentPanel({ type: 'doc', content: [{ type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: long }] }] }, options);
    expect(lengthBudget(heading!, { targetLocale: 'fr', layout: 'landscape' })).toBe(Math.ceil(long.length * 1.25 * 1.05));
    expect(lengthBudget(heading!, { targetLocale: 'fr', layout: 'portrait' })).toBe(long.length);
    expect(lengthBudget(heading!, { targetLocale: 'fr' })).toBe(long.length);
  });
});
