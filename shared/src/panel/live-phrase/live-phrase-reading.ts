import { isWidgetType, widgetModule } from '../../widgets/index.js';
import type { WidgetReading } from '../live-value/live-value-reading.js';
import { livePhrasesIn, widgetsIn, type PanelLivePhraseRef, type PanelWidgetRef } from '../panel-queries.js';
import type { PanelPath } from '../panel-json.js';
import type { LivePhraseWordings } from './live-phrase-wordings.js';

export type LivePhraseReading =
  | { ok: true; state: string; text: string }
  | { ok: false; reason: 'no-widget' | 'widget-not-computable' | 'no-states' | 'no-wording' };

/** The wording for the state the phrase's widget is in now, read from the same readings as live values. */
export function readLivePhrase(phrase: { widgetId: string; wordings: LivePhraseWordings }, readings: ReadonlyMap<string, WidgetReading>): LivePhraseReading {
  const reading = readings.get(phrase.widgetId);
  if (!reading) return { ok: false, reason: 'no-widget' };
  if (!reading.ok) return { ok: false, reason: 'widget-not-computable' };
  if (reading.state === null) return { ok: false, reason: 'no-states' };
  const text = Object.hasOwn(phrase.wordings, reading.state) ? phrase.wordings[reading.state] : undefined;
  return text === undefined ? { ok: false, reason: 'no-wording' } : { ok: true, state: reading.state, text };
}

/** As a visitor reads it: an em dash where no wording fits, as a live value shows one where no number can be read. */
export const livePhraseText = (reading: LivePhraseReading): string => (reading.ok ? reading.text : '—');

/** The states a widget declares for live phrases to follow; empty for a widget that has none. */
export const phraseStatesOf = (widget: Pick<PanelWidgetRef, 'widgetType'>): readonly string[] =>
  (isWidgetType(widget.widgetType) ? widgetModule(widget.widgetType).states?.values : undefined) ?? [];

export interface DanglingLivePhrase {
  path: PanelPath;
  phraseId: string;
  widgetId: string;
  message: string;
}

function problemOf(phrase: PanelLivePhraseRef, widgets: readonly PanelWidgetRef[]): string | null {
  const widget = widgets.find((candidate) => candidate.widgetId === phrase.widgetId);
  if (!widget) return `This live phrase follows widget ${phrase.widgetId}, which is no longer on this panel.`;
  const states = phraseStatesOf(widget);
  if (states.length === 0) return `Widget ${phrase.widgetId} has no states for a live phrase to follow.`;
  const missing = states.filter((state) => !Object.hasOwn(phrase.wordings, state));
  if (missing.length > 0) return `This live phrase has no wording for ${missing.map((state) => `"${state}"`).join(' or ')}.`;
  const unknown = Object.keys(phrase.wordings).filter((state) => !states.includes(state));
  if (unknown.length > 0) return `Widget ${phrase.widgetId} is never ${unknown.map((state) => `"${state}"`).join(' or ')}; its states are ${states.join(', ')}.`;
  return null;
}

/**
 * Live phrases that cannot follow their widget: it is gone, declares no states, or the phrase is
 * not worded for exactly its states. Preflight blocks these; the document check lets them be saved
 * so a curator can delete a widget mid-edit.
 */
export function danglingLivePhrases(doc: unknown): DanglingLivePhrase[] {
  const widgets = widgetsIn(doc);
  return livePhrasesIn(doc).flatMap((phrase) => {
    const message = problemOf(phrase, widgets);
    return message === null ? [] : [{ path: phrase.path, phraseId: phrase.phraseId, widgetId: phrase.widgetId, message }];
  });
}
