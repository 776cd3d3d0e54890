import { mergeAttributes, Node } from '@tiptap/core';
import { LIVE_PHRASE_NODE } from '../panel-json.js';
import { uniqueWidgetIds } from '../widget/unique-widget-ids.js';
import { jsonFromHTML, panelIdAttribute } from '../node-attributes.js';
import { isPanelId, newPanelId } from '../widget/widget-id.js';
import { assertLivePhraseWordings, isLivePhraseWordings, type LivePhraseWordings } from './live-phrase-wordings.js';

export interface InsertLivePhraseOptions {
  widgetId: string;
  wordings: LivePhraseWordings;
}

export interface LivePhraseOptions {
  HTMLAttributes: Record<string, unknown>;
}

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    livePhrase: {
      /** Inserts a live phrase at the cursor, worded once per state of a widget on this panel. */
      insertLivePhrase: (options: InsertLivePhraseOptions) => ReturnType;
      /** Replaces the wordings of the live phrase with this id (the side form's save). */
      setLivePhraseWordings: (phraseId: string, wordings: LivePhraseWordings) => ReturnType;
    };
  }
}

/** Like a widget id, with its own prefix so a translator's unit id says what it is. */
const newPhraseId = (): string => newPanelId('ph');

const wordingsFromHTML = (element: HTMLElement) => jsonFromHTML(element, 'data-wordings', isLivePhraseWordings);

/**
 * Words in running text that follow a widget's state: one wording while the block holds, another
 * once it slides, so a caption never contradicts what the visitor just did. An atom like a live
 * value; its wordings are edited in the side form, and each is its own translation unit, found by
 * `phraseId`. Whether its states are the widget's is checked by preflight, not the schema, so a
 * curator can save while the widget is being changed.
 */
export const LivePhrase = Node.create<LivePhraseOptions>({
  name: LIVE_PHRASE_NODE,
  group: 'inline',
  inline: true,
  atom: true,
  selectable: true,

  addOptions() {
    return { HTMLAttributes: {} };
  },

  addAttributes() {
    return {
      phraseId: panelIdAttribute('phraseId', 'data-phrase-id'),
      widgetId: panelIdAttribute('widgetId', 'data-widget-id'),
      wordings: {
        default: null,
        validate: assertLivePhraseWordings,
        parseHTML: wordingsFromHTML,
        renderHTML: (attributes: Record<string, unknown>) => ({ 'data-wordings': JSON.stringify(attributes.wordings) }),
      },
    };
  },

  parseHTML() {
    return [
      {
        tag: 'span[data-live-phrase]',
        getAttrs: (element: HTMLElement) =>
          isPanelId(element.getAttribute('data-phrase-id')) && isPanelId(element.getAttribute('data-widget-id')) && wordingsFromHTML(element) ? null : false,
      },
    ];
  },

  renderHTML({ HTMLAttributes }) {
    return ['span', mergeAttributes({ 'data-live-phrase': '' }, this.options.HTMLAttributes, HTMLAttributes)];
  },

  addCommands() {
    return {
      insertLivePhrase:
        ({ widgetId, wordings }) =>
          ({ commands }) =>
            commands.insertContent({ type: this.name, attrs: { phraseId: newPhraseId(), widgetId, wordings } }),
      setLivePhraseWordings:
        (phraseId, wordings) =>
          ({ tr, state, dispatch }) => {
            let found: number | null = null;
            state.doc.descendants((node, pos) => {
              if (found === null && node.type.name === this.name && node.attrs.phraseId === phraseId) found = pos;
              return found === null;
            });
            if (found === null) return false;
            if (dispatch) tr.setNodeAttribute(found, 'wordings', wordings);
            return true;
          },
    };
  },

  addProseMirrorPlugins() {
    return [uniqueWidgetIds(this.name, 'phraseId', newPhraseId)];
  },
});
