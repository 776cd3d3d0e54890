import { isWidgetType, widgetModule } from '../../widgets/index.js';
import { isNodeLike, visitPanelNodes, type PanelNodeJSON } from '../panel-json.js';
import { widgetsIn } from '../panel-queries.js';
import { wordsOf } from '../panel-text.js';

export interface StateWordInText {
  /** As written in the text. */
  word: string;
  widgetId: string;
  widgetType: string;
}

/** A block's own typed words; live values and phrases stand apart as spaces, since they follow the widget. */
function plainBlockText(block: PanelNodeJSON): string {
  return (block.content ?? [])
    .filter(isNodeLike)
    .map((node) => (node.type === 'text' && typeof node.text === 'string' ? node.text : ' '))
    .join('');
}

/**
 * Words in a panel's plain text that name a state a visitor can change on that panel ("slides" on
 * a panel with a slope the visitor tilts): the sentence may say the opposite of what the visitor
 * sees. Each widget declares its words per language; a regional tag (fr-CA) uses its language's.
 */
export function stateWordsInPlainText(doc: unknown, locale: string): StateWordInText[] {
  const language = locale.toLowerCase().split('-')[0] ?? locale;
  const watched = widgetsIn(doc).flatMap(({ widgetId, widgetType }) => {
    const states = isWidgetType(widgetType) ? widgetModule(widgetType).states : undefined;
    const words = states?.visitorChangesState ? states.stateWords[language] : undefined;
    return words ? [{ widgetId, widgetType, words: new Set(words) }] : [];
  });
  if (watched.length === 0) return [];
  const found: StateWordInText[] = [];
  visitPanelNodes(doc, (node) => {
    if (node.type !== 'paragraph' && node.type !== 'heading') return;
    for (const word of wordsOf(plainBlockText(node), locale)) {
      const match = watched.find((widget) => widget.words.has(word.toLocaleLowerCase(locale)));
      if (match) found.push({ word, widgetId: match.widgetId, widgetType: match.widgetType });
    }
  });
  return found;
}
