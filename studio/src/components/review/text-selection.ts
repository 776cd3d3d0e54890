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

/**
 * The selection as offsets into the panel's own running text (shared `panelText`: one block per
 * line, no widget or image captions), which is what the server keeps a comment's range against.
 * The drawing's text differs from it (captions, labels, no line breaks), so the quote is looked up
 * in the running text, at the occurrence nearest to where it sat in the drawing. Null when the
 * quote is not running text (a caption or a widget's label).
 */
export function anchorInPanelText(panelText: string, selected: CommentRange): CommentRange | null {
  // The drawing puts no break between blocks ("risesDeep"), so any two characters may have white space between them.
  const characters = [...selected.quote.replace(/\s+/g, '')].map((character) => character.replace(/[.*+?^${}()|[\]\\]/g, '\\$&'));
  if (characters.length === 0) return null;
  const pattern = new RegExp(characters.join('\\s*'), 'gu');
  let best: CommentRange | null = null;
  for (const match of panelText.matchAll(pattern)) {
    const candidate = { from: match.index, to: match.index + match[0].length, quote: match[0] };
    if (!best || Math.abs(candidate.from - selected.from) < Math.abs(best.from - selected.from)) best = candidate;
  }
  return best;
}
