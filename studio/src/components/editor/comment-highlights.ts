import { Extension } from '@tiptap/core';
import { Plugin, PluginKey, type EditorState } from '@tiptap/pm/state';
import { Decoration, DecorationSet } from '@tiptap/pm/view';
import { commentsOnDraft, documentRange, panelTextIndex, type CommentView, type PanelDocJSON } from '@mantlepiece/shared';

interface HighlightState {
  comments: readonly CommentView[];
  panelId: number;
  locale: string;
  decorations: DecorationSet;
}

const key = new PluginKey<HighlightState>('commentHighlights');

/** Marks the words each open comment is about, found in the current text by the carry-over rule. */
function decorate(state: Pick<EditorState, 'doc'>, comments: readonly CommentView[], panelId: number, locale: string): DecorationSet {
  if (comments.length === 0) return DecorationSet.empty;
  const drafted = commentsOnDraft(comments, panelId, state.doc.toJSON() as PanelDocJSON, locale);
  if (drafted.every(({ range }) => range === null)) return DecorationSet.empty;
  const index = panelTextIndex(state.doc, locale);
  const marks = drafted.flatMap(({ comment, range, changed }) => {
    const at = range && !changed ? documentRange(index, range) : null;
    return at ? [Decoration.inline(at.from, at.to, { class: 'mp-comment-anchor', 'data-comment-id': String(comment.id) })] : [];
  });
  return DecorationSet.create(state.doc, marks);
}

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    commentHighlights: {
      /** The revision's comments to mark in this panel's text. */
      showComments: (comments: readonly CommentView[], panelId: number, locale: string) => ReturnType;
    };
  }
}

/** Studio-only: decorations, never part of the document, so the saved panel is unchanged. */
export const CommentHighlights = Extension.create({
  name: 'commentHighlights',

  addCommands() {
    return {
      showComments:
        (comments, panelId, locale) =>
          ({ tr, dispatch }) => {
            if (dispatch) tr.setMeta(key, { comments, panelId, locale }).setMeta('addToHistory', false);
            return true;
          },
    };
  },

  addProseMirrorPlugins() {
    return [
      new Plugin<HighlightState>({
        key,
        state: {
          init: () => ({ comments: [], panelId: 0, locale: 'en', decorations: DecorationSet.empty }),
          apply(tr, previous, _old, state) {
            const shown = tr.getMeta(key) as Pick<HighlightState, 'comments' | 'panelId' | 'locale'> | undefined;
            const next = shown ? { ...previous, ...shown } : previous;
            if (!shown && !tr.docChanged) return previous;
            return { ...next, decorations: decorate(state, next.comments, next.panelId, next.locale) };
          },
        },
        props: { decorations: (state) => key.getState(state)?.decorations },
      }),
    ];
  },
});
