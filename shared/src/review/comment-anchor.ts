import type { CommentRange } from './views.js';

/** Where a carried comment's range lands in a newer revision's panel text, and whether its words are gone. */
export interface CarriedAnchor {
  range: CommentRange;
  changed: boolean;
}

/**
 * Follows a comment's quoted words into the newer text of its panel: in place when they are still
 * there, else to the occurrence nearest their old place (the words moved because text before them
 * changed). When the words are nowhere, the range stays where it was, clipped to the text, and the
 * anchor counts as changed, so the reviewer knows the comment is about words that were rewritten.
 */
export function carryAnchor(range: CommentRange, text: string): CarriedAnchor {
  if (text.slice(range.from, range.to) === range.quote) return { range, changed: false };
  let nearest: number | null = null;
  for (let at = range.quote === '' ? -1 : text.indexOf(range.quote); at >= 0; at = text.indexOf(range.quote, at + 1)) {
    if (nearest === null || Math.abs(at - range.from) < Math.abs(nearest - range.from)) nearest = at;
  }
  if (nearest !== null) return { range: { from: nearest, to: nearest + range.quote.length, quote: range.quote }, changed: false };
  const from = Math.min(range.from, text.length);
  return { range: { from, to: Math.max(from, Math.min(range.to, text.length)), quote: range.quote }, changed: true };
}
