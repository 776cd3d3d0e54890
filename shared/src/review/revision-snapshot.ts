import type { Audience } from '../authoring/views.js';
import type { PanelDocJSON } from '../panel/panel-json.js';
import { mediaIdsIn, widgetsIn } from '../panel/panel-queries.js';
import { sha256HexOfBytes } from '../release/verify.js';

/** A panel as the server holds it when a story is submitted: its document in every locale. */
export interface SnapshotPanelInput {
  id: number;
  position: number;
  wordBudget: number;
  /** Tiptap JSON per BCP 47 locale; the story's source locale must be there. */
  docs: Readonly<Record<string, PanelDocJSON>>;
}

export interface SnapshotStoryInput {
  id: number;
  title: string;
  audience: Audience;
  sourceLocale: string;
  panels: readonly SnapshotPanelInput[];
}

export interface SnapshotWidget {
  widgetId: string;
  widgetType: string;
  params: Record<string, unknown>;
}

export interface SnapshotPanel {
  id: number;
  position: number;
  wordBudget: number;
  docs: Record<string, PanelDocJSON>;
  /** The widgets of the source-locale document, in document order. */
  widgets: SnapshotWidget[];
  /** Media assets any locale's document shows, source locale first, each once. */
  mediaIds: string[];
}

/** What a revision is: everything a reviewer approves, so its hash changes when any of it does. */
export interface RevisionSnapshot {
  /** Bumped if the snapshot's shape changes, so an old hash is never compared with a new shape. */
  format: 1;
  story: { id: number; title: string; audience: Audience; sourceLocale: string };
  /** In position order. */
  panels: SnapshotPanel[];
  /** Every media asset the story shows, in order of first use. */
  mediaIds: string[];
}

function snapshotPanel(panel: SnapshotPanelInput, sourceLocale: string): SnapshotPanel {
  const source = panel.docs[sourceLocale];
  if (!source) throw new RangeError(`Panel ${panel.id} has no document in the story's source locale ${sourceLocale}.`);
  const locales = [sourceLocale, ...Object.keys(panel.docs).filter((locale) => locale !== sourceLocale).sort()];
  return {
    id: panel.id,
    position: panel.position,
    wordBudget: panel.wordBudget,
    docs: structuredClone({ ...panel.docs }),
    widgets: widgetsIn(source).map(({ widgetId, widgetType, params }) => ({ widgetId, widgetType, params: structuredClone(params) })),
    mediaIds: [...new Set(locales.flatMap((locale) => mediaIdsIn(panel.docs[locale])))],
  };
}

/** A deep copy of the story as submitted, so later edits to the draft cannot reach the revision. */
export function buildRevisionSnapshot(story: SnapshotStoryInput): RevisionSnapshot {
  const panels = [...story.panels].sort((a, b) => a.position - b.position || a.id - b.id).map((panel) => snapshotPanel(panel, story.sourceLocale));
  return {
    format: 1,
    story: { id: story.id, title: story.title, audience: story.audience, sourceLocale: story.sourceLocale },
    panels,
    mediaIds: [...new Set(panels.flatMap((panel) => panel.mediaIds))],
  };
}

/**
 * JSON with object keys sorted by UTF-16 code units and no whitespace: the ordering rule of the
 * JSON Canonicalization Scheme (RFC 8785). Numbers and strings are written as JSON.stringify
 * writes them, which is also what RFC 8785 prescribes. Values JSON cannot hold are refused rather
 * than silently dropped, since a hash over a lossy serialisation would not pin the content.
 */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value === 'boolean' || typeof value === 'string') return JSON.stringify(value);
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new TypeError(`${value} has no JSON form.`);
    return JSON.stringify(value);
  }
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (typeof value === 'object') {
    const entries = Object.entries(value).filter(([, item]) => item !== undefined);
    entries.sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([key, item]) => `${JSON.stringify(key)}:${canonicalJson(item)}`).join(',')}}`;
  }
  throw new TypeError(`A ${typeof value} has no JSON form.`);
}

/** SHA-256 of the UTF-8 bytes of a text, as lower-case hex, through WebCrypto (Node 20 and browsers alike). */
export const sha256Hex = (text: string): Promise<string> => sha256HexOfBytes(new TextEncoder().encode(text));

/** The revision's content hash: SHA-256 over the snapshot's canonical JSON. */
export const revisionHash = (snapshot: RevisionSnapshot): Promise<string> => sha256Hex(canonicalJson(snapshot));
