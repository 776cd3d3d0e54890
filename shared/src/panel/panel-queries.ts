import { isLiveValueFormat, DEFAULT_LIVE_VALUE_FORMAT, type LiveValueFormat } from './live-value/live-value-format.js';
import { isLivePhraseWordings, type LivePhraseWordings } from './live-phrase/live-phrase-wordings.js';
import { isPlainObject, LIVE_PHRASE_NODE, LIVE_VALUE_NODE, PANEL_IMAGE_NODE, visitPanelNodes, WIDGET_NODE, type PanelPath } from './panel-json.js';

export interface PanelWidgetRef {
  path: PanelPath;
  widgetType: string;
  widgetId: string;
  params: Record<string, unknown>;
  /** Whether visitors may open its model card ("How do we know?"). */
  visitorModelCard: boolean;
}

export interface PanelLiveValueRef {
  path: PanelPath;
  widgetId: string;
  output: string;
  format: LiveValueFormat;
}

const text = (value: unknown) => (typeof value === 'string' ? value : '');

/** Every widget block in document order. */
export function widgetsIn(doc: unknown): PanelWidgetRef[] {
  const widgets: PanelWidgetRef[] = [];
  visitPanelNodes(doc, (node, path) => {
    if (node.type !== WIDGET_NODE) return;
    const attrs = node.attrs ?? {};
    widgets.push({ path, widgetType: text(attrs.widgetType), widgetId: text(attrs.widgetId), params: isPlainObject(attrs.params) ? attrs.params : {}, visitorModelCard: attrs.visitorModelCard === true });
  });
  return widgets;
}

/** Every live value in document order. */
export function liveValuesIn(doc: unknown): PanelLiveValueRef[] {
  const values: PanelLiveValueRef[] = [];
  visitPanelNodes(doc, (node, path) => {
    if (node.type !== LIVE_VALUE_NODE) return;
    const attrs = node.attrs ?? {};
    values.push({ path, widgetId: text(attrs.widgetId), output: text(attrs.output), format: isLiveValueFormat(attrs.format) ? attrs.format : DEFAULT_LIVE_VALUE_FORMAT });
  });
  return values;
}

export interface PanelLivePhraseRef {
  path: PanelPath;
  phraseId: string;
  widgetId: string;
  wordings: LivePhraseWordings;
}

/** Every live phrase in document order. */
export function livePhrasesIn(doc: unknown): PanelLivePhraseRef[] {
  const phrases: PanelLivePhraseRef[] = [];
  visitPanelNodes(doc, (node, path) => {
    if (node.type !== LIVE_PHRASE_NODE) return;
    const attrs = node.attrs ?? {};
    phrases.push({ path, phraseId: text(attrs.phraseId), widgetId: text(attrs.widgetId), wordings: isLivePhraseWordings(attrs.wordings) ? attrs.wordings : {} });
  });
  return phrases;
}

/** The media assets a panel shows, each once, in order of first use (for rights checks and "where used"). */
export function mediaIdsIn(doc: unknown): string[] {
  const ids = new Set<string>();
  visitPanelNodes(doc, (node) => {
    const mediaId = node.type === PANEL_IMAGE_NODE ? text(node.attrs?.mediaId) : '';
    if (mediaId) ids.add(mediaId);
  });
  return [...ids];
}
