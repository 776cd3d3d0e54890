import { LIVE_PHRASE_NODE, LIVE_VALUE_NODE, type PanelMarkJSON, type PanelNodeJSON, type PanelPath } from '../panel/panel-json.js';
import { canonicalJson, sha256Hex } from '../review/revision-snapshot.js';

/** What a unit is on screen; the translator's table filters and the XLIFF context note use it. */
export type UnitKind = 'heading' | 'paragraph' | 'listItem' | 'quote' | 'widgetText' | 'livePhrase' | 'altText' | 'storyTitle';

/**
 * A piece of unit content. Paired placeholders (bold, italic, link) open and close around text;
 * standalone ones (live value, line break) stand for a node the translator moves but never types.
 */
export type UnitRun =
  | { type: 'text'; text: string }
  | { type: 'open'; id: string }
  | { type: 'close'; id: string }
  | { type: 'standalone'; id: string };

export type Placeholder =
  | { id: string; kind: 'paired'; mark: PanelMarkJSON }
  | { id: string; kind: 'standalone'; node: PanelNodeJSON };

/** Where a unit's text goes back when a translation is applied. */
export type UnitLocation =
  | { type: 'textBlock'; path: PanelPath }
  | { type: 'widgetParam'; widgetId: string; param: string[] }
  /** One wording of a live phrase, found by its id wherever the translated block put it. */
  | { type: 'livePhrase'; phraseId: string; state: string }
  | { type: 'altText'; mediaId: string }
  /** A story's title: the kiosk's story menu and attract loop show it. */
  | { type: 'storyTitle'; storyId: string };

export interface UnitContext {
  panelId?: string;
  /** The panel's place in its story, counted from 1, as the curator sees it in the panel strip. */
  panelNumber?: number;
  headingLevel?: number;
  widgetType?: string;
  /** The widget state a live phrase's wording is shown in. */
  state?: string;
  mediaId?: string;
  storyId?: string;
}

export interface TranslationUnit {
  id: string;
  kind: UnitKind;
  sourceLocale: string;
  location: UnitLocation;
  context: UnitContext;
  runs: UnitRun[];
  placeholders: Placeholder[];
  /** The source as the translator reads it: `Hot rock {1}rises{/1} at {2} cm a year`. */
  display: string;
  /** Characters a reader sees, placeholders counted at the width they take on screen. */
  sourceLength: number;
  /** SHA-256 (hex) of `canonicalSource`: equal hashes mean the translator's source has not moved. */
  sourceHash: string;
}

/** A unit before its hash is known (hashing is asynchronous in WebCrypto). */
export type UnhashedUnit = Omit<TranslationUnit, 'sourceHash'>;

/** A literal "{" is written "{{" so it can never be read as a placeholder. */
const escapeText = (text: string) => text.replaceAll('{', '{{');

/** The plain form with numbered placeholders; the stored text of a translation uses the same form. */
export function displayOf(runs: readonly UnitRun[]): string {
  return runs
    .map((run) => {
      if (run.type === 'text') return escapeText(run.text);
      if (run.type === 'close') return `{/${run.id}}`;
      return `{${run.id}}`;
    })
    .join('');
}

const PLACEHOLDER_TOKEN = /\{\{|\{(\/?)(\d{1,4})\}/g;

/**
 * Reads translated text in the display form back into runs. Whether `{n}` opens a pair or stands
 * alone is the source unit's placeholder kind; an id the source does not have is kept as a
 * standalone run so `checkPlaceholders` can name it.
 */
export function runsFromText(unit: Pick<TranslationUnit, 'placeholders'>, text: string): UnitRun[] {
  const kinds = new Map(unit.placeholders.map((placeholder) => [placeholder.id, placeholder.kind]));
  const runs: UnitRun[] = [];
  let buffer = '';
  let last = 0;
  for (const match of text.matchAll(PLACEHOLDER_TOKEN)) {
    buffer += text.slice(last, match.index);
    last = match.index + match[0].length;
    if (match[0] === '{{') {
      buffer += '{';
      continue;
    }
    if (buffer) runs.push({ type: 'text', text: buffer });
    buffer = '';
    const id = match[2] as string;
    if (match[1]) runs.push({ type: 'close', id });
    else runs.push({ type: kinds.get(id) === 'paired' ? 'open' : 'standalone', id });
  }
  buffer += text.slice(last);
  if (buffer) runs.push({ type: 'text', text: buffer });
  return runs;
}

/**
 * What a placeholder is, for the hash: the mark type, the live value's widget and output, or the
 * live phrase's id. Left out on purpose: a link's href, a live value's rounding and a live phrase's
 * wordings. The first two are restored from the current source whenever a translation is applied,
 * and each wording is a unit of its own, so changing them does not call for a new translation of
 * the sentence around them.
 */
function placeholderIdentity(placeholder: Placeholder): unknown {
  if (placeholder.kind === 'paired') return { mark: placeholder.mark.type };
  const { type, attrs = {} } = placeholder.node;
  if (type === LIVE_VALUE_NODE) return { node: type, widgetId: attrs.widgetId, output: attrs.output };
  if (type === LIVE_PHRASE_NODE) return { node: type, widgetId: attrs.widgetId, phraseId: attrs.phraseId };
  return { node: type };
}

/** The canonical source: the runs, each placeholder spelt out as what it is. */
export function canonicalSource(unit: Pick<TranslationUnit, 'runs' | 'placeholders'>): string {
  const byId = new Map(unit.placeholders.map((placeholder) => [placeholder.id, placeholder]));
  return canonicalJson(
    unit.runs.map((run) => {
      if (run.type === 'text') return ['text', run.text];
      const placeholder = byId.get(run.id);
      return [run.type, run.id, placeholder ? placeholderIdentity(placeholder) : null];
    }),
  );
}

export async function withSourceHash(unit: UnhashedUnit): Promise<TranslationUnit> {
  return { ...unit, sourceHash: await sha256Hex(canonicalSource(unit)) };
}
