import { isLivePhraseWordings } from '../panel/live-phrase/index.js';
import { isNodeLike, LIVE_PHRASE_NODE, LIVE_VALUE_NODE, type PanelMarkJSON, type PanelNodeJSON } from '../panel/panel-json.js';
import { DEFAULT_LIVE_VALUE_FORMAT, isLiveValueFormat } from '../panel/live-value/index.js';
import { panelSchema } from '../panel/panel-extensions.js';
import { canonicalJson } from '../review/revision-snapshot.js';
import type { Placeholder, UnitRun } from './translation-unit.js';

export interface InlineSource {
  runs: UnitRun[];
  placeholders: Placeholder[];
}

const sameMark = (a: PanelMarkJSON, b: PanelMarkJSON) => a.type === b.type && canonicalJson(a.attrs ?? {}) === canonicalJson(b.attrs ?? {});

/**
 * A text block's inline content as runs. Marks become properly nested pairs: a mark shared by
 * neighbouring text nodes stays one pair, which is what lets XLIFF carry it as one `<pc>`. Marks
 * keep ProseMirror's order on every node, so comparing the open stack as a prefix is enough.
 */
export function inlineSource(block: PanelNodeJSON): InlineSource {
  const runs: UnitRun[] = [];
  const placeholders: Placeholder[] = [];
  const open: { id: string; mark: PanelMarkJSON }[] = [];
  const nextId = () => String(placeholders.length + 1);

  const closeDownTo = (depth: number) => {
    while (open.length > depth) runs.push({ type: 'close', id: (open.pop() as { id: string }).id });
  };

  for (const node of (block.content ?? []).filter(isNodeLike)) {
    const marks = node.marks ?? [];
    let shared = 0;
    while (shared < open.length && shared < marks.length && sameMark(open[shared]!.mark, marks[shared]!)) shared += 1;
    closeDownTo(shared);
    for (const mark of marks.slice(shared)) {
      const id = nextId();
      placeholders.push({ id, kind: 'paired', mark: structuredClone(mark) });
      open.push({ id, mark });
      runs.push({ type: 'open', id });
    }
    if (node.type === 'text') {
      if (node.text) runs.push({ type: 'text', text: node.text });
      continue;
    }
    const id = nextId();
    const { marks: _carried, ...bare } = node;
    placeholders.push({ id, kind: 'standalone', node: structuredClone(bare) });
    runs.push({ type: 'standalone', id });
  }
  closeDownTo(0);
  return { runs, placeholders };
}

let markRank: Map<string, number> | undefined;

/** Marks in the schema's order, the order ProseMirror itself keeps them in. */
function rankOf(type: string): number {
  markRank ??= new Map(Object.keys(panelSchema().marks).map((name, index) => [name, index]));
  return markRank.get(type) ?? Number.MAX_SAFE_INTEGER;
}

/**
 * Inline nodes from runs whose placeholders have been checked. Text takes the marks of every pair
 * it sits in (one mark per type, the innermost winning); standalone nodes take them too, so a live
 * value inside bold text stays bold. Neighbouring text with equal marks is joined, as ProseMirror would.
 */
export function inlineNodes(runs: readonly UnitRun[], placeholders: readonly Placeholder[]): PanelNodeJSON[] {
  const byId = new Map(placeholders.map((placeholder) => [placeholder.id, placeholder]));
  const active: PanelMarkJSON[] = [];
  const nodes: PanelNodeJSON[] = [];
  const currentMarks = () => {
    const byType = new Map<string, PanelMarkJSON>();
    for (const mark of active) byType.set(mark.type, mark);
    return [...byType.values()].sort((a, b) => rankOf(a.type) - rankOf(b.type)).map((mark) => structuredClone(mark));
  };
  const push = (node: PanelNodeJSON) => {
    const marks = currentMarks();
    const withMarks = marks.length > 0 ? { ...node, marks } : node;
    const previous = nodes.at(-1);
    if (node.type === 'text' && previous?.type === 'text' && canonicalJson(previous.marks ?? []) === canonicalJson(marks)) {
      previous.text = `${previous.text ?? ''}${node.text ?? ''}`;
    } else nodes.push(withMarks);
  };

  for (const run of runs) {
    const placeholder = run.type === 'text' ? undefined : byId.get(run.id);
    if (run.type === 'text') {
      if (run.text) push({ type: 'text', text: run.text });
    } else if (run.type === 'open' && placeholder?.kind === 'paired') active.push(placeholder.mark);
    else if (run.type === 'close' && placeholder?.kind === 'paired') active.splice(active.lastIndexOf(placeholder.mark), 1);
    else if (run.type === 'standalone' && placeholder?.kind === 'standalone') push(structuredClone(placeholder.node));
  }
  return nodes;
}

/** Characters a live value takes on screen: its significant digits, a decimal sign and its unit. */
function liveValueWidth(node: PanelNodeJSON): number {
  const format = isLiveValueFormat(node.attrs?.format) ? node.attrs.format : DEFAULT_LIVE_VALUE_FORMAT;
  return format.digits + 1 + format.unit.length;
}

const graphemes = new Intl.Segmenter('und', { granularity: 'grapheme' });
export const characterCount = (text: string) => Array.from(graphemes.segment(text)).length;

/** A live phrase takes the room of its longest wording, the one that may be showing. */
function livePhraseWidth(node: PanelNodeJSON): number {
  const wordings = isLivePhraseWordings(node.attrs?.wordings) ? Object.values(node.attrs.wordings) : [];
  return Math.max(0, ...wordings.map(characterCount));
}

function placeholderWidth(placeholder: Placeholder | undefined): number {
  if (placeholder?.kind !== 'standalone') return 0;
  if (placeholder.node.type === LIVE_VALUE_NODE) return liveValueWidth(placeholder.node);
  if (placeholder.node.type === LIVE_PHRASE_NODE) return livePhraseWidth(placeholder.node);
  return 0;
}

/** Visible length of a unit: text in user-perceived characters, live values and phrases at their drawn width. */
export function visibleLength(runs: readonly UnitRun[], placeholders: readonly Placeholder[]): number {
  const byId = new Map(placeholders.map((placeholder) => [placeholder.id, placeholder]));
  return runs.reduce((length, run) => length + (run.type === 'text' ? characterCount(run.text) : placeholderWidth(byId.get(run.id))), 0);
}
