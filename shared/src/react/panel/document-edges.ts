import { Extension } from '@tiptap/core';
import type { Node as ProseMirrorNode } from '@tiptap/pm/model';
import { GapCursor } from '@tiptap/pm/gapcursor';
import { Selection } from '@tiptap/pm/state';

/**
 * Where the cursor goes for "start of the panel" or "end of the panel". A panel may start (or end)
 * with a widget; the cursor then sits before (or after) it as a gap cursor, so what is typed or
 * pasted lands there in a new paragraph, rather than on the widget or inside the text past it.
 */
export function panelEdgeSelection(doc: ProseMirrorNode, edge: 'start' | 'end'): Selection {
  // A block that holds no cursor (a widget or an image) at the edge leaves only the gap beside it.
  const block = edge === 'start' ? doc.firstChild : doc.lastChild;
  if (block?.isAtom) return new GapCursor(doc.resolve(edge === 'start' ? 0 : doc.content.size));
  return edge === 'start' ? Selection.atStart(doc) : Selection.atEnd(doc);
}

/** Ctrl+Home and Ctrl+End (⌘ on a Mac) go to the panel's very start and end, before a widget that starts it. */
export const PanelDocumentEdges = Extension.create({
  name: 'panelDocumentEdges',
  // Ahead of the browser's own caret move, which cannot stop before a block it cannot enter.
  priority: 1000,

  addKeyboardShortcuts() {
    const goTo = (edge: 'start' | 'end') => () => {
      const { state, view } = this.editor;
      view.dispatch(state.tr.setSelection(panelEdgeSelection(state.doc, edge)).scrollIntoView());
      return true;
    };
    return { 'Mod-Home': goTo('start'), 'Mod-End': goTo('end') };
  },
});
