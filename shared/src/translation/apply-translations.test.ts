import { describe, expect, it } from 'vitest';
import { checkPanelDocument } from '../panel/check-panel-document.js';
import { examplePanelDoc } from '../panel/example-panel.js';
import type { PanelNodeJSON } from '../panel/panel-json.js';
import { applyTranslations } from './apply-translations.js';
import { checkPlaceholders } from './check-placeholders.js';
import { segmentPanel } from './segment-panel.js';
import { runsFromText, type TranslationUnit } from './translation-unit.js';

const options = { panelId: 42, sourceLocale: 'en' };
const french: Record<string, string> = {
  'p42.heading.1': 'Pourquoi la roche glisse-t-elle ?',
  // The translator moves the live value and swaps the bold and italic pairs.
  'p42.paragraph.1': 'Au-delà de {3}, le bloc glisse : il est {2}pressé{/2} contre la roche et tiré vers le {1}bas{/1}.{4}En savoir plus sur {5}notre site{/5}.',
  'p42.heading.2': 'À vous',
  'p42.listItem.1': 'Inclinez la pente.',
  'p42.listItem.2': 'Regardez le bloc.',
  'p42.listItem.3': 'Demandez à un guide.',
  'p42.quote.1': 'La roche tient, jusqu’au jour où elle lâche.',
};

const unitsOf = () => segmentPanel(examplePanelDoc(), options);
const ownText = (units: TranslationUnit[]) => Object.fromEntries(units.map((unit) => [unit.id, unit.display]));
const content = (doc: PanelNodeJSON, index: number) => (doc.content as PanelNodeJSON[])[index]?.content;

describe('applyTranslations', () => {
  it('gives back the source document exactly when each unit is "translated" into its own source', async () => {
    const units = await unitsOf();
    const applied = applyTranslations(examplePanelDoc(), units, ownText(units));
    expect(applied).toEqual({ doc: examplePanelDoc(), untranslated: [], refused: [] });
  });

  it('replaces the text and restores marks and live values where the translator moved them', async () => {
    const units = await unitsOf();
    const { doc, untranslated, refused } = applyTranslations(examplePanelDoc(), units, french);
    expect([untranslated, refused]).toEqual([[], []]);
    expect(content(doc, 1)).toEqual([
      { type: 'text', text: 'Au-delà de ' },
      { type: 'liveValue', attrs: { widgetId: 'ridge-slope', output: 'criticalAngleDeg', format: { digits: 2, unit: '°' } } },
      { type: 'text', text: ', le bloc glisse : il est ' },
      { type: 'text', text: 'pressé', marks: [{ type: 'italic' }] },
      { type: 'text', text: ' contre la roche et tiré vers le ' },
      { type: 'text', text: 'bas', marks: [{ type: 'bold' }] },
      { type: 'text', text: '.' },
      { type: 'hardBreak' },
      { type: 'text', text: 'En savoir plus sur ' },
      { type: 'text', text: 'notre site', marks: [{ type: 'link', attrs: { href: 'https://basalt-point.example/slopes' } }] },
      { type: 'text', text: '.' },
    ]);
    expect(content(doc, 5)).toEqual([{ type: 'listItem', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Demandez à un guide.' }] }] }]);
    expect((doc.content as PanelNodeJSON[])[2]).toEqual((examplePanelDoc().content as PanelNodeJSON[])[2]);
    expect(checkPanelDocument(doc)).toEqual({ ok: true, doc });
  });

  it('keeps marks in schema order when the translator nests pairs the other way round', async () => {
    const doc = { type: 'doc' as const, content: [{ type: 'paragraph', content: [{ type: 'text', text: 'a', marks: [{ type: 'bold' }] }, { type: 'text', text: 'b', marks: [{ type: 'bold' }, { type: 'italic' }] }] }] };
    const units = await segmentPanel(doc, options);
    expect(units[0]?.display).toBe('{1}a{2}b{/2}{/1}');
    const applied = applyTranslations(doc, units, { 'p42.paragraph.1': '{2}B{1}A{/1}{/2}' });
    expect(applied.doc.content?.[0]?.content).toEqual([
      { type: 'text', text: 'B', marks: [{ type: 'italic' }] },
      { type: 'text', text: 'A', marks: [{ type: 'bold' }, { type: 'italic' }] },
    ]);
    expect(checkPanelDocument(applied.doc).ok).toBe(true);
  });

  it('falls back to the source text for units without a translation and says which', async () => {
    const units = await unitsOf();
    const { doc, untranslated } = applyTranslations(examplePanelDoc(), units, { 'p42.heading.1': 'Pourquoi ?' });
    expect(untranslated).toEqual(units.slice(1).map((unit) => unit.id));
    expect(content(doc, 0)).toEqual([{ type: 'text', text: 'Pourquoi ?' }]);
    expect(content(doc, 1)).toEqual(content(examplePanelDoc(), 1));
  });

  it('keeps the source text of a unit whose translation breaks a placeholder, and reports it', async () => {
    const units = await unitsOf();
    const { doc, refused } = applyTranslations(examplePanelDoc(), units, { 'p42.paragraph.1': 'Le bloc {1}glisse{/1}.' });
    expect(refused.map((entry) => entry.unitId)).toEqual(['p42.paragraph.1']);
    expect(content(doc, 1)).toEqual(content(examplePanelDoc(), 1));
  });

  it('carries literal braces in the text through the display form', async () => {
    const doc = { type: 'doc' as const, content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Set {1} to 2' }] }] };
    const units = await segmentPanel(doc, options);
    expect(units[0]?.display).toBe('Set {{1} to 2');
    expect(applyTranslations(doc, units, { 'p42.paragraph.1': 'Mettez {{1} à 2' }).doc.content?.[0]?.content).toEqual([{ type: 'text', text: 'Mettez {1} à 2' }]);
  });
});

describe('checkPlaceholders', () => {
  const problemsFor = async (text: string) => {
    const unit = (await unitsOf())[1] as TranslationUnit;
    return checkPlaceholders(unit, runsFromText(unit, text)).map((problem) => problem.message);
  };

  it('allows every placeholder to move and pairs to swap order', async () => {
    expect(await problemsFor('{5}Site{/5} {4}{3} {2}b{/2} {1}a{/1}')).toEqual([]);
  });

  it('refuses a dropped placeholder', async () => {
    expect(await problemsFor('{1}a{/1} {2}b{/2} {3} {5}c{/5}')).toEqual(['Placeholder {4} is missing; every placeholder in the source must stay.']);
  });

  it('refuses an added or repeated placeholder', async () => {
    expect(await problemsFor('{1}a{/1} {2}b{/2} {3}{4}{5}c{/5} {6}')).toEqual(['Placeholder {6} is not in the source; remove it.']);
    expect(await problemsFor('{1}a{/1} {2}b{/2} {3}{3}{4}{5}c{/5}')).toEqual(['Placeholder {3} appears more than once; the source has it once.']);
  });

  it('refuses broken pairs: unclosed, closed first, crossing, or a standalone used as a pair', async () => {
    expect(await problemsFor('{1}a {2}b{/2} {3}{4}{5}c{/5}')).toEqual(['{1} is never closed; add {/1}.']);
    expect(await problemsFor('{/1}a{1} {2}b{/2} {3}{4}{5}c{/5}')).toContain('{/1} closes before its {1} opens.');
    expect(await problemsFor('{1}a{2}b{/1}{/2} {3}{4}{5}c{/5}')).toContain('{/1} closes while {2} inside it is still open; close the inner one first.');
    expect(await problemsFor('{1}a{/1} {2}b{/2} {3}x{/3}{4}{5}c{/5}')).toContain('Placeholder {3} stands alone in the source and has no closing {/3}.');
  });
});
