import type { Node as ProseMirrorNode } from '@tiptap/pm/model';
import { readPanelWidgets } from '../panel/live-value/live-value-reading.js';
import type { PanelNodeJSON } from '../panel/panel-json.js';
import { widgetsIn } from '../panel/panel-queries.js';
import { inlineText, panelText } from '../panel/panel-text.js';
import { carryAnchor } from './comment-anchor.js';
import type { CommentRange, CommentView } from './views.js';

/** An open comment of a revision as it lands on the draft being written now. */
export interface DraftComment {
  comment: CommentView;
  /** Where its words are in the draft's panel text, or null for a comment on the whole panel. */
  range: CommentRange | null;
  /** Its words are no longer in the draft: the range is where they were. */
  changed: boolean;
}

/**
 * The open threads of one panel, each anchor followed into the draft's current text by the same
 * rule that carries comments to a newer revision, so the curator sees each comment beside the
 * words it is about even after editing around them.
 */
export function commentsOnDraft(comments: readonly CommentView[], panelId: number, doc: unknown, locale: string): DraftComment[] {
  const text = panelText(doc, { locale });
  return comments
    .filter((comment) => comment.parentId === null && comment.panelId === panelId && comment.resolvedAt === null)
    .map((comment) => {
      if (!comment.range) return { comment, range: null, changed: false };
      const anchor = carryAnchor(comment.range, text);
      return { comment, range: anchor.range, changed: anchor.changed };
    });
}

/** Open threads (not replies): what the curator still has to answer. */
export const openThreadCount = (comments: readonly CommentView[]): number => comments.filter((comment) => comment.parentId === null && comment.resolvedAt === null).length;

export interface PanelTextIndex {
  /** Equal to `panelText` of the same document. */
  text: string;
  /** The document position of each character of `text`; a live value's characters all sit on its node. */
  positions: number[];
}

/** `panelText` of an editor's document, with where each character is in it, to draw comment ranges over the words. */
export function panelTextIndex(doc: ProseMirrorNode, locale: string): PanelTextIndex {
  const readings = readPanelWidgets(widgetsIn(doc.toJSON()));
  const lines: PanelTextIndex[] = [];
  doc.descendants((node, pos) => {
    if (node.type.name !== 'paragraph' && node.type.name !== 'heading') return true;
    let text = '';
    const positions: number[] = [];
    node.forEach((child, offset) => {
      const start = pos + 1 + offset;
      const piece = child.isText ? (child.text ?? '') : inlineText(child.toJSON() as PanelNodeJSON, readings, locale);
      for (let index = 0; index < piece.length; index += 1) positions.push(child.isText ? start + index : start);
      text += piece;
    });
    const lead = text.length - text.trimStart().length;
    const trimmed = text.trim();
    if (trimmed) lines.push({ text: trimmed, positions: positions.slice(lead, lead + trimmed.length) });
    return false;
  });
  return {
    text: lines.map((line) => line.text).join('\n'),
    positions: lines.flatMap((line, index) => (index === lines.length - 1 ? line.positions : [...line.positions, (line.positions.at(-1) ?? 0) + 1])),
  };
}

/** A range of panel text as document positions, or null when it covers no character. */
export function documentRange(index: PanelTextIndex, range: CommentRange): { from: number; to: number } | null {
  if (range.to <= range.from || range.from >= index.positions.length) return null;
  const from = index.positions[range.from]!;
  const to = index.positions[Math.min(range.to, index.positions.length) - 1]! + 1;
  return to > from ? { from, to } : null;
}
