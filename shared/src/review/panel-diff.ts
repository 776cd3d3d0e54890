import { diffWords } from 'diff';
import { isPlainObject } from '../panel/panel-json.js';
import { panelText } from '../panel/panel-text.js';
import { canonicalJson, type RevisionSnapshot, type SnapshotPanel, type SnapshotWidget } from './revision-snapshot.js';

export interface TextPiece {
  kind: 'same' | 'added' | 'removed';
  text: string;
}

/** One setting that differs; a side that is missing had no such setting. */
export interface ParamChange {
  /** Property names from the params root, as in `['physical', 'depthM']`. */
  path: string[];
  before?: unknown;
  after?: unknown;
}

export type WidgetChange =
  | { kind: 'added' | 'removed'; widgetId: string; widgetType: string; params: Record<string, unknown> }
  | { kind: 'changed'; widgetId: string; widgetType: string; params: ParamChange[] };

export interface PanelDiff {
  panelId: number;
  status: 'added' | 'removed' | 'changed' | 'unchanged';
  /** 1-based place in each revision's panel order; missing on the side without the panel. */
  numberBefore?: number;
  numberAfter?: number;
  /** The panel's running text, word by word, as a visitor reads it. */
  text: TextPiece[];
  widgets: WidgetChange[];
  /** Media assets the panel now shows and no longer shows, by id. */
  media: { added: string[]; removed: string[] };
}

function paramChanges(before: unknown, after: unknown, path: string[] = []): ParamChange[] {
  if (isPlainObject(before) && isPlainObject(after)) {
    const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])].sort();
    return keys.flatMap((key) => paramChanges(before[key], after[key], [...path, key]));
  }
  if (before === undefined && after === undefined) return [];
  if (before !== undefined && after !== undefined && canonicalJson(before) === canonicalJson(after)) return [];
  return [{ path, ...(before === undefined ? {} : { before }), ...(after === undefined ? {} : { after }) }];
}

/** Widgets are matched by id; a widget whose type changed under the same id is one removed and one added. */
function widgetChanges(before: readonly SnapshotWidget[], after: readonly SnapshotWidget[]): WidgetChange[] {
  const earlier = new Map(before.map((widget) => [widget.widgetId, widget]));
  const later = new Map(after.map((widget) => [widget.widgetId, widget]));
  const sameWidget = (widget: SnapshotWidget, other: SnapshotWidget | undefined): other is SnapshotWidget => other?.widgetType === widget.widgetType;
  const changes: WidgetChange[] = before
    .filter((widget) => !sameWidget(widget, later.get(widget.widgetId)))
    .map(({ widgetId, widgetType, params }) => ({ kind: 'removed', widgetId, widgetType, params }));
  for (const widget of after) {
    const { widgetId, widgetType } = widget;
    const previous = earlier.get(widgetId);
    if (!sameWidget(widget, previous)) {
      changes.push({ kind: 'added', widgetId, widgetType, params: widget.params });
      continue;
    }
    const params = paramChanges(previous.params, widget.params);
    if (params.length > 0) changes.push({ kind: 'changed', widgetId, widgetType, params });
  }
  return changes;
}

/** Two texts word by word (words as the locale's segmenter finds them); the translator's stale-source view uses it too. */
export function textPieces(before: string, after: string, locale: string): TextPiece[] {
  if (before === after) return before === '' ? [] : [{ kind: 'same', text: before }];
  const intlSegmenter = new Intl.Segmenter(locale, { granularity: 'word' });
  return diffWords(before, after, { intlSegmenter }).map((change) => ({
    kind: change.added ? 'added' : change.removed ? 'removed' : 'same',
    text: change.value,
  }));
}

const textOf = (panel: SnapshotPanel | undefined, locale: string) => {
  const doc = panel?.docs[locale];
  return doc ? panelText(doc, { locale }) : '';
};

function panelDiff(before: SnapshotPanel | undefined, after: SnapshotPanel | undefined, numbers: { before?: number; after?: number }, locale: string): PanelDiff {
  const text = textPieces(textOf(before, locale), textOf(after, locale), locale);
  const widgets = widgetChanges(before?.widgets ?? [], after?.widgets ?? []);
  const mediaBefore = before?.mediaIds ?? [];
  const mediaAfter = after?.mediaIds ?? [];
  const media = { added: mediaAfter.filter((id) => !mediaBefore.includes(id)), removed: mediaBefore.filter((id) => !mediaAfter.includes(id)) };
  const changed = text.some((piece) => piece.kind !== 'same') || widgets.length > 0 || media.added.length > 0 || media.removed.length > 0;
  return {
    panelId: (after ?? before)!.id,
    status: !before ? 'added' : !after ? 'removed' : changed ? 'changed' : 'unchanged',
    ...(numbers.before === undefined ? {} : { numberBefore: numbers.before }),
    ...(numbers.after === undefined ? {} : { numberAfter: numbers.after }),
    text,
    widgets,
    media,
  };
}

/**
 * What changed between the last approved revision and the one under review, panel by panel, in
 * one locale (the story's source locale unless asked). With no earlier revision every panel is new.
 * Panels are in the new revision's order, then the removed ones in their old order.
 */
export function diffRevisions(before: RevisionSnapshot | null, after: RevisionSnapshot, locale: string = after.story.sourceLocale): PanelDiff[] {
  const earlier = before?.panels ?? [];
  const earlierById = new Map(earlier.map((panel, index) => [panel.id, { panel, number: index + 1 }]));
  const laterIds = new Set(after.panels.map((panel) => panel.id));
  const current = after.panels.map((panel, index) => {
    const previous = earlierById.get(panel.id);
    return panelDiff(previous?.panel, panel, { before: previous?.number, after: index + 1 }, locale);
  });
  const removed = earlier.flatMap((panel, index) => (laterIds.has(panel.id) ? [] : [panelDiff(panel, undefined, { before: index + 1 }, locale)]));
  return [...current, ...removed];
}
