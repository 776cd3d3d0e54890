import { runsFromText, type Placeholder, type TranslationUnitView } from '@mantlepiece/shared';

type WithPlaceholders = Pick<TranslationUnitView, 'placeholders'>;

export type PlaceholderUse = 'placed' | 'missing' | 'repeated';

/** The key of the words for what a placeholder stands for, in `placeholderMeanings`. */
export function meaningOf(placeholder: Placeholder): 'bold' | 'italic' | 'link' | 'liveValue' | 'hardBreak' | 'other' {
  const type = placeholder.kind === 'paired' ? placeholder.mark.type : placeholder.node.type;
  return type === 'bold' || type === 'italic' || type === 'link' || type === 'liveValue' || type === 'hardBreak' ? type : 'other';
}

/** How a placeholder is written: `{1}` alone, or `{1}` … `{/1}` around text. */
export const tokenOf = (placeholder: Placeholder) => (placeholder.kind === 'paired' ? `{${placeholder.id}}…{/${placeholder.id}}` : `{${placeholder.id}}`);

/** Whether each placeholder of the source is in the text once, not at all, or more than once. */
export function placeholderUses(unit: WithPlaceholders, text: string): Map<string, PlaceholderUse> {
  const counts = new Map<string, number>();
  for (const run of runsFromText(unit, text)) {
    if (run.type === 'open' || run.type === 'standalone') counts.set(run.id, (counts.get(run.id) ?? 0) + 1);
  }
  return new Map(unit.placeholders.map((placeholder) => {
    const count = counts.get(placeholder.id) ?? 0;
    return [placeholder.id, count === 0 ? 'missing' : count === 1 ? 'placed' : 'repeated'];
  }));
}

export interface TextSelection {
  start: number;
  end: number;
}

/**
 * Puts a placeholder into the text where the translator's selection is: a paired one wraps the
 * selected words, a single one goes in at the cursor (replacing nothing). Returns the new text and
 * where the cursor goes: after the closing token, or inside an empty pair so typing fills it.
 */
export function insertPlaceholder(text: string, { start, end }: TextSelection, placeholder: Placeholder): { text: string; cursor: number } {
  const before = text.slice(0, start);
  const selected = text.slice(start, end);
  const after = text.slice(end);
  if (placeholder.kind === 'standalone') {
    const token = `{${placeholder.id}}`;
    return { text: `${before}${selected}${token}${after}`, cursor: end + token.length };
  }
  const open = `{${placeholder.id}}`;
  const close = `{/${placeholder.id}}`;
  const cursor = selected ? start + open.length + selected.length + close.length : start + open.length;
  return { text: `${before}${open}${selected}${close}${after}`, cursor };
}
