import { describe, expect, it } from 'vitest';
import { examplePanelDoc } from './example-panel.js';
import { mediaIdsIn, liveValuesIn, widgetsIn } from './panel-queries.js';
import { panelText, wordCount } from './panel-text.js';

describe('panelText', () => {
  it('gives one line per text block, live values written out in the locale, widgets and images left out', () => {
    expect(panelText(examplePanelDoc())).toBe(
      [
        'Why does rock slide?',
        'A block on a slope is pulled down and pressed into the rock. It starts to slide above 40°. Read more at our website.',
        'Try it',
        'Tilt the slope.',
        'Watch the block.',
        'Ask a guide.',
        'Rock holds until it does not.',
      ].join('\n'),
    );
  });

  it('writes live values as the locale shows numbers', () => {
    const doc = examplePanelDoc();
    const live = doc.content?.[1]?.content?.[5];
    if (live?.attrs) live.attrs.format = { digits: 3, unit: '°' };
    expect(panelText(doc, { locale: 'fr' })).toContain('slide above 40,4°.');
  });
});

describe('wordCount', () => {
  it('counts words and numbers, not punctuation or dashes', () => {
    // Hot · rock · rises · slowly · at · 2.5 · cm · a · year
    expect(wordCount('Hot rock rises — slowly, at 2.5 cm a year!')).toBe(9);
  });

  it('counts the example panel (4 + 13 + 6 + 5 + 2 + 3 + 3 + 3 + 6 words by hand)', () => {
    expect(wordCount(panelText(examplePanelDoc()))).toBe(45);
  });
});

describe('document queries', () => {
  it('list widgets, live values and media with their paths', () => {
    const doc = examplePanelDoc();
    expect(widgetsIn(doc)).toEqual([
      { path: ['content', 2], widgetType: 'slope-force', widgetId: 'ridge-slope', params: { massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6 }, visitorModelCard: false },
    ]);
    expect(liveValuesIn(doc)).toEqual([{ path: ['content', 1, 'content', 5], widgetId: 'ridge-slope', output: 'criticalAngleDeg', format: { digits: 2, unit: '°' } }]);
    expect(mediaIdsIn(doc)).toEqual(['ridge-photo']);
  });

  it('list each media asset once', () => {
    const doc = examplePanelDoc();
    doc.content?.push({ type: 'panelImage', attrs: { mediaId: 'ridge-photo' } }, { type: 'panelImage', attrs: { mediaId: 'slab-map' } });
    expect(mediaIdsIn(doc)).toEqual(['ridge-photo', 'slab-map']);
  });
});
