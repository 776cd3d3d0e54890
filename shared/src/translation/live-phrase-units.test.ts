import { describe, expect, it } from 'vitest';
import type { PanelDocJSON, PanelNodeJSON } from '../panel/panel-json.js';
import { applyTranslations } from './apply-translations.js';
import { segmentPanel } from './segment-panel.js';
import { unitStatus } from './unit-status.js';

const phrase = (wordings: Record<string, string>): PanelNodeJSON => ({ type: 'livePhrase', attrs: { phraseId: 'ph-1', widgetId: 'ridge-slope', wordings } });
const panel = (wordings: Record<string, string>, before = 'The block '): PanelDocJSON => ({
  type: 'doc',
  content: [
    { type: 'paragraph', content: [{ type: 'text', text: before }, phrase(wordings), { type: 'text', text: '.' }] },
    { type: 'widget', attrs: { widgetType: 'slope-force', widgetId: 'ridge-slope', params: { massKg: 10, angleDeg: 20, staticFriction: 0.6, kineticFriction: 0.5 } } },
  ],
});
const wordings = { holds: 'holds fast', slides: 'starts to slide' };
const units = (doc: PanelDocJSON) => segmentPanel(doc, { panelId: 7, sourceLocale: 'en', panelNumber: 1 });

describe('live phrases as translation units', () => {
  it('give one unit per wording, after the sentence that holds the phrase as a placeholder', async () => {
    const cut = await units(panel(wordings));
    expect(cut.map(({ id, kind, display }) => ({ id, kind, display }))).toEqual([
      { id: 'p7.paragraph.1', kind: 'paragraph', display: 'The block {1}.' },
      { id: 'p7.phrase.ph-1.holds', kind: 'livePhrase', display: 'holds fast' },
      { id: 'p7.phrase.ph-1.slides', kind: 'livePhrase', display: 'starts to slide' },
    ]);
    expect(cut[2]?.context).toMatchObject({ widgetType: 'slope-force', state: 'slides' });
    // The sentence is as long as its text plus its longest wording, "starts to slide" (15 characters).
    expect(cut[0]?.sourceLength).toBe('The block .'.length + 15);
  });

  it('make only the changed wording stale: the sentence around it keeps its translation', async () => {
    const before = await units(panel(wordings));
    const after = await units(panel({ ...wordings, slides: 'begins to slip' }));
    const stored = Object.fromEntries(before.map((unit) => [unit.id, { sourceHash: unit.sourceHash, text: 'x' }]));
    expect(after.map((unit) => [unit.id, unitStatus({ sourceHash: unit.sourceHash, translation: stored[unit.id] })])).toEqual([
      ['p7.paragraph.1', 'translated'],
      ['p7.phrase.ph-1.holds', 'translated'],
      ['p7.phrase.ph-1.slides', 'stale'],
    ]);
  });

  it('put each translated wording on the phrase wherever the translated sentence placed it', async () => {
    const cut = await units(panel(wordings));
    const { doc, untranslated, refused } = applyTranslations(panel(wordings), cut, {
      'p7.paragraph.1': 'Le bloc {1}.',
      'p7.phrase.ph-1.holds': 'tient bon',
      'p7.phrase.ph-1.slides': 'se met à glisser',
    });
    expect({ untranslated, refused }).toEqual({ untranslated: [], refused: [] });
    expect(doc.content?.[0]?.content).toEqual([{ type: 'text', text: 'Le bloc ' }, phrase({ holds: 'tient bon', slides: 'se met à glisser' }), { type: 'text', text: '.' }]);
  });

  it('keep the source wording for a state left untranslated', async () => {
    const cut = await units(panel(wordings));
    const { doc, untranslated } = applyTranslations(panel(wordings), cut, { 'p7.paragraph.1': 'Le bloc {1}.', 'p7.phrase.ph-1.holds': 'tient bon' });
    expect(untranslated).toEqual(['p7.phrase.ph-1.slides']);
    expect(doc.content?.[0]?.content?.[1]).toEqual(phrase({ holds: 'tient bon', slides: 'starts to slide' }));
  });
});
