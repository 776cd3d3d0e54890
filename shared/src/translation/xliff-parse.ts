import { SaxesParser, type SaxesAttributeNS, type SaxesTagNS } from 'saxes';
import type { UnitRun } from './translation-unit.js';
import { SOURCE_HASH_NOTE, XLIFF_NAMESPACE } from './xliff-export.js';

export interface XliffProblem {
  unitId?: string;
  message: string;
}

export interface ParsedXliffUnit {
  id: string;
  /** From the `sourceHash` note the export wrote; absent when a tool dropped the notes. */
  sourceHash?: string;
  sourceRuns: UnitRun[];
  /** Absent when the file has no target for the unit. */
  targetRuns?: UnitRun[];
}

/** A `<file>` element: our export writes one, its `original` naming the story (`story/7`). */
export interface ParsedXliffFile {
  id?: string;
  original?: string;
}

export interface ParsedXliff {
  srcLang: string;
  trgLang?: string;
  files: ParsedXliffFile[];
  units: ParsedXliffUnit[];
}

export type XliffParse = { ok: true; xliff: ParsedXliff } | { ok: false; problems: XliffProblem[] };

const SUPPORTED_VERSIONS = ['2.0', '2.1'];

class Refusal extends Error {}

/** saxes starts its messages with "line:column: "; the place is said once, in words, before the parser's reason. */
function malformedMessage(error: unknown, line: number, column: number): string {
  const reason = (error instanceof Error ? error.message : String(error)).replace(/^(?:[^:]*:)?\d+:\d+:\s*/, '');
  return `The file is not well-formed XML at line ${line}, column ${column}: ${reason}.`;
}

interface PartContent {
  source: UnitRun[];
  target?: UnitRun[];
  ignorable: boolean;
}

interface OpenUnit {
  id: string;
  notes: { category: string; text: string }[];
  parts: PartContent[];
}

function pushText(runs: UnitRun[], text: string): void {
  const last = runs.at(-1);
  if (last?.type === 'text') last.text += text;
  else if (text) runs.push({ type: 'text', text });
}

/** Adds a run, joining text to the text before it. */
function addRun(runs: UnitRun[], run: UnitRun): void {
  if (run.type === 'text') pushText(runs, run.text);
  else runs.push(run);
}

const attribute = (tag: SaxesTagNS, name: string): string | undefined => {
  const found = (tag.attributes as Record<string, SaxesAttributeNS>)[name];
  return found && found.uri === '' ? found.value : undefined;
};

const HASH_NOTE = /^sha256:([0-9a-f]{64})$/;

/** The export's hash note; matched by its text as well, since some tools write notes back without their category. */
function sourceHashOf(notes: readonly { category: string; text: string }[]): string | undefined {
  const note = notes.find(({ category, text }) => category === SOURCE_HASH_NOTE && HASH_NOTE.test(text)) ?? notes.find(({ text }) => HASH_NOTE.test(text));
  return note ? HASH_NOTE.exec(note.text)?.[1] : undefined;
}

/** A unit's runs across its segments, in order, as the standard reads a unit's content. */
function joinParts(unit: OpenUnit): { sourceRuns: UnitRun[]; targetRuns?: UnitRun[] } | XliffProblem {
  const sourceRuns: UnitRun[] = [];
  for (const part of unit.parts) for (const run of part.source) addRun(sourceRuns, run);
  const segments = unit.parts.filter((part) => !part.ignorable);
  const translated = segments.filter((part) => part.target !== undefined).length;
  if (translated === 0) return { sourceRuns };
  if (translated < segments.length) return { unitId: unit.id, message: `Unit ${unit.id} is only partly translated: ${translated} of ${segments.length} segments have a target.` };
  const targetRuns: UnitRun[] = [];
  for (const part of unit.parts) for (const run of part.target ?? part.source) addRun(targetRuns, run);
  return { sourceRuns, targetRuns };
}

/**
 * Reads an XLIFF 2.0 or 2.1 document with saxes, a strict (well-formedness checking) parser that
 * implements no DTD processing at all. A document with a DOCTYPE is refused the moment the parser
 * reaches it, before any entity could be declared, so nothing is ever expanded (billion laughs) or
 * fetched (external entities); a reference to any entity other than the five predefined ones is a
 * well-formedness error. Never throws: every problem comes back in the list.
 */
export function parseXliff(xml: string): XliffParse {
  const parser = new SaxesParser({ xmlns: true, position: true });
  const problems: XliffProblem[] = [];
  const units: ParsedXliffUnit[] = [];
  const files: ParsedXliffFile[] = [];
  const seenIds = new Set<string>();
  let root: { srcLang: string; trgLang?: string } | undefined;
  let unit: OpenUnit | undefined;
  let part: PartContent | undefined;
  let content: UnitRun[] | undefined;
  let note: { category: string; text: string } | undefined;
  /** Ids of the `<pc>` elements open inside the content being read, to close them in order. */
  const openCodes: (string | null)[] = [];
  /** Depth inside an element whose content we do not read (another module's metadata). */
  let skipping = 0;
  let depth = 0;

  const refuse = (message: string, unitId?: string): never => {
    problems.push({ unitId, message });
    throw new Refusal(message);
  };

  parser.on('doctype', () => refuse('The file has a DOCTYPE; XLIFF needs none, and files with one are refused so no entity is ever expanded or fetched.'));
  parser.on('opentag', (tag) => {
    depth += 1;
    if (skipping > 0) {
      skipping += 1;
      return;
    }
    const name = tag.uri === XLIFF_NAMESPACE ? tag.local : `{${tag.uri}}${tag.local}`;
    if (depth === 1) {
      if (tag.local !== 'xliff' || tag.uri !== XLIFF_NAMESPACE) refuse(`This is not an XLIFF 2 file: the root element must be <xliff xmlns="${XLIFF_NAMESPACE}">.`);
      const version = attribute(tag, 'version');
      if (!version || !SUPPORTED_VERSIONS.includes(version)) refuse(`XLIFF version ${version ?? '(none)'} is not supported; export as XLIFF 2.0 or 2.1.`);
      const srcLang = attribute(tag, 'srcLang');
      if (!srcLang) return refuse('The <xliff> element has no srcLang.');
      root = { srcLang, trgLang: attribute(tag, 'trgLang') };
      return;
    }
    if (content) {
      if (name === 'pc') {
        const id = attribute(tag, 'id') ?? refuse('A <pc> code has no id.', unit?.id);
        content.push({ type: 'open', id });
        openCodes.push(id);
      } else if (name === 'ph') content.push({ type: 'standalone', id: attribute(tag, 'id') ?? refuse('A <ph> code has no id.', unit?.id) });
      else if (name === 'sc') content.push({ type: 'open', id: attribute(tag, 'id') ?? refuse('An <sc> code has no id.', unit?.id) });
      else if (name === 'ec') content.push({ type: 'close', id: attribute(tag, 'startRef') ?? attribute(tag, 'id') ?? refuse('An <ec> code has no startRef.', unit?.id) });
      else if (name === 'cp') {
        const code = Number.parseInt(attribute(tag, 'hex') ?? '', 16);
        if (!Number.isInteger(code) || code < 0 || code > 0x10ffff) refuse('A <cp> element has no valid hex code point.', unit?.id);
        pushText(content, String.fromCodePoint(code));
      } else if (name !== 'mrk' && name !== 'sm' && name !== 'em') refuse(`<${tag.name}> is not XLIFF inline content.`, unit?.id);
      // <mrk> annotations (terms, comments a tool added) are transparent: their text is read, they are not kept.
      if (name === 'mrk') openCodes.push(null);
      return;
    }
    if (name === 'file') {
      files.push({ id: attribute(tag, 'id'), original: attribute(tag, 'original') });
      return;
    }
    if (name === 'group') return;
    if (name === 'unit') {
      const id = attribute(tag, 'id') ?? refuse('A <unit> has no id.');
      if (seenIds.has(id)) refuse(`Unit ${id} appears twice in the file.`, id);
      seenIds.add(id);
      unit = { id, notes: [], parts: [] };
      return;
    }
    if (unit && (name === 'notes' || name === 'originalData')) return;
    if (unit && name === 'note') {
      note = { category: attribute(tag, 'category') ?? '', text: '' };
      return;
    }
    if (unit && (name === 'segment' || name === 'ignorable')) {
      part = { source: [], ignorable: name === 'ignorable' };
      unit.parts.push(part);
      return;
    }
    if (part && name === 'source') {
      content = part.source;
      return;
    }
    if (part && name === 'target') {
      part.target = [];
      content = part.target;
      return;
    }
    skipping = 1;
  });
  parser.on('text', (text) => {
    if (skipping > 0) return;
    if (content) pushText(content, text);
    else if (note) note.text += text;
  });
  parser.on('cdata', (text) => {
    if (content) pushText(content, text);
  });
  parser.on('closetag', (tag) => {
    depth -= 1;
    if (skipping > 0) {
      skipping -= 1;
      return;
    }
    const name = tag.uri === XLIFF_NAMESPACE ? tag.local : tag.name;
    if (content && (name === 'pc' || name === 'mrk')) {
      const id = openCodes.pop();
      if (id) content.push({ type: 'close', id });
      return;
    }
    if (name === 'source' || name === 'target') content = undefined;
    else if (name === 'segment' || name === 'ignorable') part = undefined;
    else if (name === 'note' && note && unit) {
      unit.notes.push({ category: note.category, text: note.text.trim() });
      note = undefined;
    } else if (name === 'unit' && unit) {
      const joined = joinParts(unit);
      if ('message' in joined) problems.push(joined);
      else {
        units.push({ id: unit.id, sourceHash: sourceHashOf(unit.notes), ...joined });
      }
      unit = undefined;
    }
  });

  try {
    parser.write(xml).close();
  } catch (error) {
    if (!(error instanceof Refusal)) problems.push({ message: malformedMessage(error, parser.line, parser.column) });
  }
  if (problems.length > 0) return { ok: false, problems };
  if (!root) return { ok: false, problems: [{ message: 'The file has no <xliff> element.' }] };
  return { ok: true, xliff: { ...root, files, units } };
}
