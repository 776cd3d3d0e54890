import { describe, expect, it } from 'vitest';
import type { PanelDocJSON, PanelNodeJSON } from '../panel/panel-json.js';
import { buildRevisionSnapshot } from '../review/revision-snapshot.js';
import { livePhraseStateWords } from './live-phrase-state-words.js';
import { livePhraseTarget } from './live-phrase-target.js';
import type { PreflightContext } from './types.js';

const text = (value: string): PanelNodeJSON => ({ type: 'text', text: value });
const phrase = (attrs: Record<string, unknown> = {}): PanelNodeJSON => ({
  type: 'livePhrase',
  attrs: { phraseId: 'ph-1', widgetId: 'ridge-slope', wordings: { holds: 'holds fast', slides: 'starts to slide' }, ...attrs },
});
const slope: PanelNodeJSON = { type: 'widget', attrs: { widgetType: 'slope-force', widgetId: 'ridge-slope', params: { massKg: 10, angleDeg: 20, staticFriction: 0.6, kineticFriction: 0.5 } } };
const panel = (...inline: PanelNodeJSON[]): PanelDocJSON => ({ type: 'doc', content: [{ type: 'paragraph', content: [text('The block '), ...inline] }, slope] });

function context(docs: Record<string, PanelDocJSON>): PreflightContext {
  const snapshot = buildRevisionSnapshot({ id: 3, title: 'Rock on a slope', audience: 'family', sourceLocale: 'en', panels: [{ id: 100, position: 1, wordBudget: 60, docs }] });
  return { snapshot, media: [], exhibitPlannedEnd: null, today: '2026-03-02' };
}
const problems = (findings: { passed: boolean; message: string }[]) => findings.filter((finding) => !finding.passed).map((finding) => finding.message);

describe('preflight: live phrase target (blocker)', () => {
  it('passes a phrase worded for each state of the slope beside it', () => {
    expect(problems(livePhraseTarget.run(context({ en: panel(phrase(), text('.')) })))).toEqual([]);
  });

  it('names a phrase missing a wording, in the language it is missing from', () => {
    const fr = panel(phrase({ wordings: { holds: 'tient bon' } }), text('.'));
    expect(problems(livePhraseTarget.run(context({ en: panel(phrase(), text('.')), fr })))).toEqual([
      'Panel 1 (“The block holds fast.”), French text: This live phrase has no wording for "slides". Word it for each state of a widget on this panel, or remove it.',
    ]);
  });
});

describe('preflight: state words in plain text (warning)', () => {
  it('warns when plain text says "slides" on a panel whose slope the visitor tilts', () => {
    expect(problems(livePhraseStateWords.run(context({ en: panel(text('slides.')) })))).toEqual([
      'Panel 1 (“The block slides.”): the text says “slides”, but a visitor can change the state of the slope force box “ridge-slope” on this panel. Use a live phrase, so the words follow the widget.',
    ]);
  });

  it('checks each language with its own words', () => {
    const fr: PanelDocJSON = { type: 'doc', content: [{ type: 'paragraph', content: [text('Le bloc glisse.')] }, slope] };
    expect(problems(livePhraseStateWords.run(context({ en: panel(phrase()), fr })))).toHaveLength(1);
  });

  it('passes the same sentence when the state is a live phrase', () => {
    const findings = livePhraseStateWords.run(context({ en: panel(phrase(), text('.')) }));
    expect(findings).toEqual([{ passed: true, panelId: 100, message: 'Panel 1 (“The block holds fast.”): no plain text names a state the visitor can change.' }]);
  });
});
