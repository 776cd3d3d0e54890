import { NodeSelection, TextSelection } from '@tiptap/pm/state';
import type { Editor } from '@tiptap/react';

/**
 * Moves a selected block (a widget or an image the curator just clicked or inserted) out of the
 * way before something new goes in, so the insertion lands after it instead of replacing it.
 */
export function insertionChain(editor: Editor) {
  const { selection, doc } = editor.state;
  if (selection instanceof NodeSelection) editor.view.dispatch(editor.state.tr.setSelection(TextSelection.near(doc.resolve(selection.to), 1)));
  return editor.chain().focus();
}
