import { isLiveValueFormat, DEFAULT_LIVE_VALUE_FORMAT } from './live-value/live-value-format.js';
import { liveValueText, readLiveValue, readPanelWidgets, type WidgetReading } from './live-value/live-value-reading.js';
import { readLivePhrase } from './live-phrase/live-phrase-reading.js';
import { isLivePhraseWordings } from './live-phrase/live-phrase-wordings.js';
import { isNodeLike, LIVE_PHRASE_NODE, LIVE_VALUE_NODE, type PanelNodeJSON } from './panel-json.js';
import { widgetsIn } from './panel-queries.js';

export interface PanelTextOptions {
  /** Live values are written out as this locale shows them; a number is a word to a reader. */
  locale?: string;
}

/** One inline node's text as `panelText` writes it; the studio maps comment ranges into the editor with it. */
export function inlineText(node: PanelNodeJSON, readings: ReadonlyMap<string, WidgetReading>, locale: string): string {
  if (node.type === 'text') return typeof node.text === 'string' ? node.text : '';
  if (node.type === 'hardBreak') return ' ';
  if (node.type === LIVE_VALUE_NODE) {
    const attrs = node.attrs ?? {};
    const reading = readLiveValue({ widgetId: String(attrs.widgetId), output: String(attrs.output) }, readings);
    return reading.ok ? liveValueText(reading, isLiveValueFormat(attrs.format) ? attrs.format : DEFAULT_LIVE_VALUE_FORMAT, locale) : '';
  }
  if (node.type === LIVE_PHRASE_NODE) {
    const attrs = node.attrs ?? {};
    const reading = readLivePhrase({ widgetId: String(attrs.widgetId), wordings: isLivePhraseWordings(attrs.wordings) ? attrs.wordings : {} }, readings);
    return reading.ok ? reading.text : '';
  }
  return (node.content ?? []).filter(isNodeLike).map((child) => inlineText(child, readings, locale)).join('');
}

function blockTexts(node: PanelNodeJSON, readings: ReadonlyMap<string, WidgetReading>, locale: string): string[] {
  const children = (node.content ?? []).filter(isNodeLike);
  if (node.type === 'paragraph' || node.type === 'heading') return [inlineText(node, readings, locale)];
  return children.flatMap((child) => blockTexts(child, readings, locale));
}

/**
 * The words a visitor reads on a panel (live values and phrases as the stored settings show them), one text block (paragraph, heading, list item) per line,
 * for word counts and reading level. Widgets and images carry no running text.
 */
export function panelText(doc: unknown, { locale = 'en' }: PanelTextOptions = {}): string {
  if (!isNodeLike(doc)) return '';
  const readings = readPanelWidgets(widgetsIn(doc));
  return blockTexts(doc, readings, locale)
    .map((line) => line.trim())
    .filter((line) => line.length > 0)
    .join('\n');
}

/** Words as the locale's own word breaking finds them, so French elisions or CJK text count fairly. */
export function wordsOf(text: string, locale = 'en'): string[] {
  const segmenter = new Intl.Segmenter(locale, { granularity: 'word' });
  return Array.from(segmenter.segment(text))
    .filter((segment) => segment.isWordLike)
    .map((segment) => segment.segment);
}

export const wordCount = (text: string, locale = 'en'): number => wordsOf(text, locale).length;
