import { Node as ProseMirrorNode } from '@tiptap/pm/model';
import { describe, expect, it } from 'vitest';
import { checkPanelDocument } from '../check-panel-document.js';
import { readPanelWidgets } from '../live-value/live-value-reading.js';
import { panelSchema } from '../panel-extensions.js';
import type { PanelDocJSON, PanelNodeJSON } from '../panel-json.js';
import { widgetsIn } from '../panel-queries.js';
import { panelText } from '../panel-text.js';
import { danglingLivePhrases, livePhraseText, readLivePhrase } from './live-phrase-reading.js';
import { stateWordsInPlainText } from './state-words.js';

const wordings = { holds: 'holds fast', slides: 'starts to slide' };
const phrase = (attrs: Record<string, unknown> = {}): PanelNodeJSON => ({ type: 'livePhrase', attrs: { phraseId: 'ph-1', widgetId: 'ridge-slope', wordings, ...attrs } });
// μs = 0.6 gives a critical angle of arctan 0.6 ≈ 30.96° (inclined plane with Coulomb friction, as in the brief).
const slope = (angleDeg: number): PanelNodeJSON => ({
  type: 'widget',
  attrs: { widgetType: 'slope-force', widgetId: 'ridge-slope', params: { massKg: 10, angleDeg, staticFriction: 0.6, kineticFriction: 0.5 }, visitorModelCard: false },
});
const panel = (angleDeg: number, ...inline: PanelNodeJSON[]): PanelDocJSON => ({
  type: 'doc',
  content: [{ type: 'paragraph', content: [{ type: 'text', text: 'The block ' }, ...inline, { type: 'text', text: '.' }] }, slope(angleDeg)],
});

describe('live phrase node: schema', () => {
  it('is accepted by the panel check with an id, a widget and a wording per state', () => {
    const checked = checkPanelDocument(panel(20, phrase()));
    expect(checked.ok).toBe(true);
    expect(checked.ok && (checked.doc.content?.[0]?.content?.[1]?.attrs)).toEqual({ phraseId: 'ph-1', widgetId: 'ridge-slope', wordings });
  });

  it('is inline: it cannot stand as a block of its own', () => {
    expect(checkPanelDocument({ type: 'doc', content: [phrase()] }).ok).toBe(false);
  });

  it.each([
    ['no wordings', { wordings: {} }],
    ['a wording that is not text', { wordings: { holds: 3 } }],
    ['a state name with spaces', { wordings: { 'not moving': 'rests' } }],
    ['a wording over two lines', { wordings: { holds: 'holds\nfast' } }],
    ['a wording of 161 characters', { wordings: { holds: 'x'.repeat(161) } }],
    ['an id with a slash', { phraseId: 'ph/1' }],
  ])('refuses %s, naming the attribute', (_, attrs) => {
    const checked = checkPanelDocument(panel(20, phrase(attrs)));
    expect(checked.ok).toBe(false);
    expect(!checked.ok && checked.errors[0]?.message).toMatch(/live phrase|id must be/i);
  });

  it('refuses two phrases of one panel with the same id, since the id names their translation units', () => {
    const checked = checkPanelDocument(panel(20, phrase(), { type: 'text', text: ' and ' }, phrase()));
    expect(!checked.ok && checked.errors).toEqual([{ path: ['content', 0, 'content', 3, 'attrs', 'phraseId'], message: 'Another live phrase on this panel already has the id ph-1.' }]);
  });

  it('round-trips through the ProseMirror schema unchanged', () => {
    const doc = panel(20, phrase());
    expect(ProseMirrorNode.fromJSON(panelSchema(), doc).toJSON()).toEqual(doc);
  });
});

describe('live phrase: choosing the wording', () => {
  const read = (angleDeg: number, visitorAngle?: number) => {
    const doc = panel(angleDeg, phrase());
    const visitor = visitorAngle === undefined ? new Map() : new Map([['ridge-slope', { massKg: 10, angleDeg: visitorAngle, staticFriction: 0.6, kineticFriction: 0.5 }]]);
    return readLivePhrase({ widgetId: 'ridge-slope', wordings }, readPanelWidgets(widgetsIn(doc), visitor));
  };

  it('shows the "holds" wording below the critical angle and the "slides" one above it (θc = arctan 0.6 ≈ 30.96°)', () => {
    expect(read(30)).toEqual({ ok: true, state: 'holds', text: 'holds fast' });
    expect(read(32)).toEqual({ ok: true, state: 'slides', text: 'starts to slide' });
  });

  it('follows the angle a visitor has set, not the stored one', () => {
    expect(read(20, 40)).toMatchObject({ state: 'slides' });
    expect(read(40, 20)).toMatchObject({ state: 'holds' });
  });

  it('shows a dash, never a wrong wording, when the widget is gone or has no such state', () => {
    expect(livePhraseText(readLivePhrase({ widgetId: 'elsewhere', wordings }, new Map()))).toBe('—');
    expect(readLivePhrase({ widgetId: 'ridge-slope', wordings: { holds: 'holds fast' } }, readPanelWidgets(widgetsIn(panel(40))))).toEqual({ ok: false, reason: 'no-wording' });
  });

  it('is part of the text a visitor reads, worded for the stored settings', () => {
    expect(panelText(panel(40, phrase()))).toBe('The block starts to slide.');
  });
});

describe('danglingLivePhrases', () => {
  it('finds none when the phrase is worded for exactly its widget’s states', () => {
    expect(danglingLivePhrases(panel(20, phrase()))).toEqual([]);
  });

  it('names a missing widget, a missing state and a state the widget never has', () => {
    const doc = panel(20, phrase({ widgetId: 'gone' }), phrase({ phraseId: 'ph-2', wordings: { holds: 'rests' } }), phrase({ phraseId: 'ph-3', wordings: { ...wordings, melts: 'melts' } }));
    expect(danglingLivePhrases(doc).map(({ message }) => message)).toEqual([
      'This live phrase follows widget gone, which is no longer on this panel.',
      'This live phrase has no wording for "slides".',
      'Widget ridge-slope is never "melts"; its states are holds, slides.',
    ]);
  });

  it('names a widget that declares no states', () => {
    const doc: PanelDocJSON = {
      type: 'doc',
      content: [
        { type: 'paragraph', content: [phrase({ widgetId: 'overturn' })] },
        { type: 'widget', attrs: { widgetType: 'convection-cell', widgetId: 'overturn', params: { rayleigh: 1e4 } } },
      ],
    };
    expect(danglingLivePhrases(doc).map(({ message }) => message)).toEqual(['Widget overturn has no states for a live phrase to follow.']);
  });
});

describe('stateWordsInPlainText', () => {
  it('finds a state word in plain text beside a slope the visitor tilts, in the panel’s language', () => {
    expect(stateWordsInPlainText(panel(20, { type: 'text', text: 'slides' }), 'en')).toEqual([{ word: 'slides', widgetId: 'ridge-slope', widgetType: 'slope-force' }]);
    expect(stateWordsInPlainText(panel(20, { type: 'text', text: 'Glisse' }), 'fr-CA').map(({ word }) => word)).toEqual(['Glisse']);
  });

  it('does not count the words of a live phrase, nor words inside other words', () => {
    expect(stateWordsInPlainText(panel(20, phrase(), { type: 'text', text: ' on the landslides' }), 'en')).toEqual([]);
  });

  it('finds nothing on a panel without a widget whose state the visitor changes', () => {
    expect(stateWordsInPlainText({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'It slides.' }] }] }, 'en')).toEqual([]);
  });
});
