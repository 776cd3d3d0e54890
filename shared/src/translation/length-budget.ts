import type { PanelLayout } from '../panel/panel-presentation.js';
import { visibleLength } from './inline-runs.js';
import type { TranslationUnit, UnitKind, UnitRun } from './translation-unit.js';

/**
 * Length of a text in a language family relative to the same text in English. Common practice,
 * from memory (localisation style guides' rules of thumb), not from a measured corpus: Romance and
 * Slavic languages run about a quarter longer, German and Dutch about a third, Finnish and
 * Hungarian longer still, Arabic about a quarter, and Chinese, Japanese and Korean take fewer
 * characters for the same sense.
 */
const LANGUAGE_FAMILIES: { languages: string[]; relativeLength: number }[] = [
  { languages: ['en'], relativeLength: 1 },
  { languages: ['fr', 'es', 'it', 'pt', 'ca', 'gl', 'ro'], relativeLength: 1.25 },
  { languages: ['de', 'nl', 'da', 'sv', 'nb', 'nn', 'no', 'is'], relativeLength: 1.3 },
  { languages: ['ru', 'uk', 'pl', 'cs', 'sk', 'sl', 'hr', 'sr', 'bg'], relativeLength: 1.25 },
  { languages: ['fi', 'et', 'hu'], relativeLength: 1.35 },
  { languages: ['ar', 'he', 'fa', 'ur'], relativeLength: 1.25 },
  { languages: ['zh', 'ja', 'ko'], relativeLength: 0.7 },
];
/** A language in none of the families above gets the most generous allowance. */
const UNKNOWN_RELATIVE_LENGTH = 1.35;

/**
 * Short texts grow more than long ones when translated (a two-word heading can double). Common
 * practice, from memory of the usual expansion tables that allow 200–300 % for strings of up to
 * ten characters and about 130 % past seventy.
 */
const shortTextAllowance = (length: number) => (length <= 10 ? 1.6 : length <= 20 ? 1.4 : length <= 50 ? 1.2 : 1.05);

/** Never less than this, so a one-word unit is not held to a handful of characters. */
export const MIN_LENGTH_BUDGET = 12;

/**
 * Characters per line of a heading on each station layout: the text width after the panel's
 * padding over the heading's font size times 0.55 em, an average glyph width for a sans face such as
 * Lexend (from memory). From the renderer's sizes (panel-theme.ts and panel-nodes.tsx): body 34 px
 * landscape, 38 px portrait; h2 1.6 em, h3 1.2 em; padding 96 px landscape, 72 px portrait.
 */
const HEADING_CHARACTERS_PER_LINE: Record<PanelLayout, Record<2 | 3, number>> = {
  landscape: { 2: 57, 3: 77 },
  portrait: { 2: 27, 3: 37 },
};
/** A heading may wrap once on a wall screen; a third line pushes the story down past the fold. */
const HEADING_LINES = 2;

const relativeLength = (locale: string) => {
  const language = locale.toLowerCase().split(/[-_]/)[0] ?? '';
  return LANGUAGE_FAMILIES.find((family) => family.languages.includes(language))?.relativeLength ?? UNKNOWN_RELATIVE_LENGTH;
};

export interface LengthBudgetOptions {
  targetLocale: string;
  /** The station layout; without one the tighter of the two is used, since a story may play on both. */
  layout?: PanelLayout;
}

/**
 * The length a translation should keep within, in characters: the source length scaled from the
 * source language to the target's, with room for short texts, never below a floor. A heading is
 * also held to two lines on the layout, though never below its own source length: a source that
 * already overflows is preflight's to report, not the translator's.
 */
export function lengthBudget(unit: Pick<TranslationUnit, 'sourceLength' | 'sourceLocale' | 'kind' | 'context'>, { targetLocale, layout }: LengthBudgetOptions): number {
  const ratio = relativeLength(targetLocale) / relativeLength(unit.sourceLocale);
  const scaled = Math.max(MIN_LENGTH_BUDGET, Math.ceil(unit.sourceLength * ratio * shortTextAllowance(unit.sourceLength)));
  if (unit.kind !== 'heading') return scaled;
  const level = unit.context.headingLevel === 3 ? 3 : 2;
  const layouts: PanelLayout[] = layout ? [layout] : ['landscape', 'portrait'];
  const lineLimit = Math.min(...layouts.map((each) => HEADING_CHARACTERS_PER_LINE[each][level] * HEADING_LINES));
  return Math.max(unit.sourceLength, Math.min(scaled, lineLimit));
}

/**
 * The longest translation stored, in the display form's UTF-16 code units: far past any budget,
 * so it never stands in for one, and well inside the database column.
 */
export const MAX_TRANSLATION_LENGTH = 10_000;

/** A translation longer than its unit's budget: kept all the same, and reported so the translator can shorten it. */
export interface LengthBudgetWarning {
  unitId: string;
  kind: UnitKind;
  /** The panel's place in the story, counted from 1; null for alt text. */
  panelNumber: number | null;
  /** Characters a reader would see, counted as the budget is. */
  length: number;
  budget: number;
  message: string;
}

/** The warning for a translation over its unit's budget, or null when it keeps within it. */
export function lengthBudgetWarning(unit: TranslationUnit, targetRuns: readonly UnitRun[], options: LengthBudgetOptions): LengthBudgetWarning | null {
  const budget = lengthBudget(unit, options);
  const length = visibleLength(targetRuns, unit.placeholders);
  if (length <= budget) return null;
  return {
    unitId: unit.id,
    kind: unit.kind,
    panelNumber: unit.context.panelNumber ?? null,
    length,
    budget,
    message: `Unit ${unit.id} is ${length} characters long, ${length - budget} over its budget of ${budget}: ${unit.kind === 'altText' ? 'alt text is read aloud by screen readers, not shown, and a long one is tiring to listen to' : 'the text may not fit on the screen'}.`,
  };
}
