import type { PanelLayout } from '../panel/panel-presentation.js';
import { checkPlaceholders } from './check-placeholders.js';
import { lengthBudget } from './length-budget.js';
import { runsFromText, type Placeholder, type TranslationUnit, type UnitKind, type UnitRun } from './translation-unit.js';
import { unitStatus, type StoredTranslation } from './unit-status.js';

export const XLIFF_NAMESPACE = 'urn:oasis:names:tc:xliff:document:2.0';
/** Note categories a re-import reads back; the others are for the translator. */
export const SOURCE_HASH_NOTE = 'sourceHash';

/** The `original` and `id` of a story's `<file>`: an import checks them, so one story's file never lands in another. */
export const storyOriginal = (storyId: string | number) => `story/${storyId}`;
export const storyFileId = (storyId: string | number) => `s${storyId}`;

export interface ExportXliffOptions {
  storyId: string | number;
  srcLang: string;
  trgLang: string;
  units: readonly TranslationUnit[];
  translations: Readonly<Record<string, StoredTranslation>>;
  layout?: PanelLayout;
}

// XML 1.0 forbids these code points outright; XLIFF 2 carries them as <cp hex="…"/>.
// eslint-disable-next-line no-control-regex -- finding these control characters is the point
const FORBIDDEN_IN_XML = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/gu;

const escapeAttribute = (value: string) =>
  value.replace(FORBIDDEN_IN_XML, '').replaceAll('&', '&amp;').replaceAll('<', '&lt;').replaceAll('>', '&gt;').replaceAll('"', '&quot;').replaceAll('\r', '&#xD;').replaceAll('\n', '&#xA;').replaceAll('\t', '&#x9;');

function escapeText(text: string): string {
  const escaped = text.replaceAll('&', '&amp;').replaceAll('<', '&lt;').replaceAll('>', '&gt;').replaceAll('\r', '&#xD;');
  return escaped.replace(FORBIDDEN_IN_XML, (char) => `<cp hex="${(char.codePointAt(0) ?? 0).toString(16).toUpperCase().padStart(4, '0')}"/>`);
}

const attributes = (values: Record<string, string | undefined>) =>
  Object.entries(values)
    .filter((entry): entry is [string, string] => entry[1] !== undefined)
    .map(([name, value]) => ` ${name}="${escapeAttribute(value)}"`)
    .join('');

/**
 * The XLIFF 2 code for a placeholder. Bold and italic use the reserved subtypes `xlf:b` and
 * `xlf:i` (type `fmt`), a link type `link` with its address shown, a line break `xlf:lb`, and a live
 * value `xlf:var`, which the standard pairs with type `ui`. Every code is `canCopy="no"
 * canDelete="no"`: tools that honour the hints stop a translator dropping or duplicating one.
 */
function codeAttributes(placeholder: Placeholder): Record<string, string | undefined> {
  const fixed = { id: placeholder.id, canCopy: 'no', canDelete: 'no' };
  if (placeholder.kind === 'paired') {
    const { type, attrs = {} } = placeholder.mark;
    if (type === 'bold') return { ...fixed, type: 'fmt', subType: 'xlf:b' };
    if (type === 'italic') return { ...fixed, type: 'fmt', subType: 'xlf:i' };
    if (type === 'link') return { ...fixed, type: 'link', dispStart: typeof attrs.href === 'string' ? attrs.href : undefined };
    return { ...fixed, type: 'fmt', dispStart: type };
  }
  const { type, attrs = {} } = placeholder.node;
  if (type === 'hardBreak') return { ...fixed, type: 'fmt', subType: 'xlf:lb', equiv: ' ' };
  if (type === 'liveValue') return { ...fixed, type: 'ui', subType: 'xlf:var', disp: `{${String(attrs.output)}}` };
  if (type === 'livePhrase') return { ...fixed, type: 'ui', subType: 'xlf:var', disp: `{${String(attrs.phraseId)}}` };
  return { ...fixed, type: 'other', disp: type };
}

export function inlineXml(runs: readonly UnitRun[], placeholders: readonly Placeholder[]): string {
  const byId = new Map(placeholders.map((placeholder) => [placeholder.id, placeholder]));
  return runs
    .map((run) => {
      if (run.type === 'text') return escapeText(run.text);
      if (run.type === 'close') return '</pc>';
      const placeholder = byId.get(run.id);
      if (!placeholder) throw new Error(`Placeholder ${run.id} has no definition.`);
      return run.type === 'open' ? `<pc${attributes(codeAttributes(placeholder))}>` : `<ph${attributes(codeAttributes(placeholder))}/>`;
    })
    .join('');
}

const KIND_WORDS: Record<UnitKind, string> = {
  heading: 'heading',
  paragraph: 'paragraph',
  listItem: 'list item',
  quote: 'quotation',
  widgetText: 'widget text',
  livePhrase: 'live phrase (shown while the widget is in the state named)',
  altText: 'image alt text (read aloud, not shown)',
  storyTitle: 'story title (on the story menu and the attract loop)',
};

function contextNote(unit: TranslationUnit): string {
  const { panelNumber, headingLevel, widgetType, state, mediaId } = unit.context;
  const parts = [
    panelNumber === undefined ? undefined : `Panel ${panelNumber}`,
    `${KIND_WORDS[unit.kind]}${headingLevel === undefined ? '' : ` (level ${headingLevel})`}`,
    widgetType === undefined ? undefined : `widget ${widgetType}`,
    state === undefined ? undefined : `state ${state}`,
    mediaId === undefined ? undefined : `media ${mediaId}`,
  ];
  return parts.filter((part) => part !== undefined).join(', ');
}

function unitXml(unit: TranslationUnit, options: ExportXliffOptions): string {
  const stored = Object.hasOwn(options.translations, unit.id) ? options.translations[unit.id] : undefined;
  // Only a translation of the current source is exported: a stale one would come back looking current.
  const targetRuns = stored && unitStatus({ sourceHash: unit.sourceHash, translation: stored }) === 'translated' ? runsFromText(unit, stored.text) : undefined;
  const target = targetRuns && checkPlaceholders(unit, targetRuns).length === 0 ? targetRuns : undefined;
  const budget = lengthBudget(unit, { targetLocale: options.trgLang, layout: options.layout });
  return [
    `    <unit${attributes({ id: unit.id, 'xml:space': 'preserve' })}>`,
    '      <notes>',
    `        <note category="context">${escapeText(contextNote(unit))}</note>`,
    `        <note category="budget" appliesTo="target">${escapeText(`At most ${budget} characters.`)}</note>`,
    `        <note category="${SOURCE_HASH_NOTE}">sha256:${unit.sourceHash}</note>`,
    '      </notes>',
    `      <segment state="${target ? 'translated' : 'initial'}">`,
    `        <source>${inlineXml(unit.runs, unit.placeholders)}</source>`,
    ...(target ? [`        <target>${inlineXml(target, unit.placeholders)}</target>`] : []),
    '      </segment>',
    '    </unit>',
  ].join('\n');
}

/** One XLIFF 2.1 document for a story in one target language: one `<file>`, one `<unit>` per translation unit. */
export function exportXliff(options: ExportXliffOptions): string {
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<xliff${attributes({ xmlns: XLIFF_NAMESPACE, version: '2.1', srcLang: options.srcLang, trgLang: options.trgLang })}>`,
    `  <file${attributes({ id: storyFileId(options.storyId), original: storyOriginal(options.storyId) })}>`,
    ...options.units.map((unit) => unitXml(unit, options)),
    '  </file>',
    '</xliff>',
    '',
  ].join('\n');
}
