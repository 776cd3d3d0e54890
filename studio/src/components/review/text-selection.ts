import type { CommentRange } from '@mantlepiece/shared';

/**
 * Where a selection sits in an element's text, as character offsets over the element's text
 * nodes in document order, with the selected words. Null when nothing, or nothing but spaces,
 * is selected inside the element.
 */
export function selectionRangeIn(root: Node, selection: Selection | null): CommentRange | null {
  if (!selection || selection.rangeCount === 0 || selection.isCollapsed) return null;
  const range = selection.getRangeAt(0);
  if (!root.contains(range.startContainer) || !root.contains(range.endContainer)) return null;
  const quote = range.toString();
  if (quote.trim() === '') return null;
  const before = root.ownerDocument!.createRange();
  before.selectNodeContents(root);
  before.setEnd(range.startContainer, range.startOffset);
  const from = before.toString().length;
  return { from, to: from + quote.length, quote };
}
