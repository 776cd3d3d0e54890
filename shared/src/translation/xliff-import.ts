import { sameLanguageTag } from '../languages/language-tags.js';
import { checkPlaceholders } from './check-placeholders.js';
import { lengthBudgetWarning, MAX_TRANSLATION_LENGTH, type LengthBudgetWarning } from './length-budget.js';
import { displayOf, type TranslationUnit } from './translation-unit.js';
import type { StoredTranslation } from './unit-status.js';
import { storyFileId, storyOriginal } from './xliff-export.js';
import type { ParsedXliffFile, XliffParse, XliffProblem } from './xliff-parse.js';

export interface XliffUpdate {
  unitId: string;
  /** The translation in the display form, ready to store. */
  text: string;
  sourceHash: string;
}

export type XliffImportPlan =
  | {
    ok: true;
    updates: XliffUpdate[];
    unchanged: string[];
    /** Every unit whose target in the file is over its length budget; the file is taken all the same. */
    warnings: LengthBudgetWarning[];
  }
  | {
    ok: false;
    problems: XliffProblem[];
    /** Set when a `<file>` names another story: the one problem reported. */
    otherStory?: OtherStory;
  };

/** The attribute of a `<file>` that names another story, and its value. */
export interface OtherStory {
  attribute: 'original' | 'id';
  value: string;
}

export interface PlanXliffImportOptions {
  parsed: XliffParse;
  /** The story the upload is for and its languages. */
  expected: { storyId: string | number; srcLang: string; trgLang: string };
  currentUnits: readonly TranslationUnit[];
  currentTranslations?: Readonly<Record<string, StoredTranslation>>;
}

/** Our export's file id; a tool's own id (anything else) names no story. */
const STORY_FILE_ID = /^s\d+$/;

/**
 * The story a `<file>` names, if it is not this one: by its `original` (`story/7`), or by its id
 * (`s7`) where a tool dropped the original but kept the id, as general-purpose libraries do.
 */
function otherStoryOf(file: ParsedXliffFile, storyId: string | number): OtherStory | undefined {
  if (file.original !== undefined) return file.original === storyOriginal(storyId) ? undefined : { attribute: 'original', value: file.original };
  if (file.id !== undefined && STORY_FILE_ID.test(file.id) && file.id !== storyFileId(storyId)) return { attribute: 'id', value: file.id };
  return undefined;
}

/**
 * What an uploaded XLIFF file would change, or every reason it is refused. The file is taken whole
 * or not at all: one problem anywhere refuses it, so a half-applied import never happens. A unit
 * whose source changed since the export is refused as stale, never overwritten: the file's source
 * hash note says what it was exported from, and where a tool dropped the notes, the file's own
 * source text is compared with the current one.
 */
export function planXliffImport({ parsed, expected, currentUnits, currentTranslations = {} }: PlanXliffImportOptions): XliffImportPlan {
  if (!parsed.ok) return { ok: false, problems: parsed.problems };
  const { xliff } = parsed;
  // Unit ids of alt texts are shared by every story showing the image, so the units alone cannot
  // tell that a file came from another story; the file's own names can.
  const otherStory = xliff.files.map((file) => otherStoryOf(file, expected.storyId)).find((other) => other !== undefined);
  if (otherStory) {
    const own = otherStory.attribute === 'original' ? storyOriginal(expected.storyId) : storyFileId(expected.storyId);
    const message = `The file's ${otherStory.attribute} is "${otherStory.value}": it was exported from another story, and this story's is "${own}". Export this story's own file and translate that.`;
    return { ok: false, otherStory, problems: [{ message }] };
  }
  const problems: XliffProblem[] = [];
  if (!sameLanguageTag(xliff.srcLang, expected.srcLang)) problems.push({ message: `The file's source language is ${xliff.srcLang}; this story is written in ${expected.srcLang}.` });
  if (!sameLanguageTag(xliff.trgLang, expected.trgLang)) problems.push({ message: `The file's target language is ${xliff.trgLang ?? '(none)'}; this upload is for ${expected.trgLang}.` });

  const byId = new Map(currentUnits.map((unit) => [unit.id, unit]));
  const updates: XliffUpdate[] = [];
  const unchanged: string[] = [];
  const warnings: LengthBudgetWarning[] = [];
  for (const fileUnit of xliff.units) {
    const current = byId.get(fileUnit.id);
    if (!current) {
      problems.push({ unitId: fileUnit.id, message: `Unit ${fileUnit.id} is not in this story; the file may be from another story or the text was removed.` });
      continue;
    }
    const stale = fileUnit.sourceHash !== undefined ? fileUnit.sourceHash !== current.sourceHash : displayOf(fileUnit.sourceRuns) !== current.display;
    if (stale) {
      problems.push({ unitId: fileUnit.id, message: `The source of unit ${fileUnit.id} has changed since this file was exported; export it again and translate the new source.` });
      continue;
    }
    if (!fileUnit.targetRuns) {
      unchanged.push(fileUnit.id);
      continue;
    }
    const placeholderProblems = checkPlaceholders(current, fileUnit.targetRuns);
    if (placeholderProblems.length > 0) {
      problems.push(...placeholderProblems.map((problem) => ({ unitId: fileUnit.id, message: problem.message })));
      continue;
    }
    const text = displayOf(fileUnit.targetRuns);
    if (text.length > MAX_TRANSLATION_LENGTH) {
      problems.push({ unitId: fileUnit.id, message: `The target of unit ${fileUnit.id} is ${text.length} characters long; a translation may be at most ${MAX_TRANSLATION_LENGTH}.` });
      continue;
    }
    const warning = lengthBudgetWarning(current, fileUnit.targetRuns, { targetLocale: expected.trgLang });
    if (warning) warnings.push(warning);
    const existing = Object.hasOwn(currentTranslations, fileUnit.id) ? currentTranslations[fileUnit.id] : undefined;
    if (text === '' || (existing?.text === text && existing.sourceHash === current.sourceHash)) unchanged.push(fileUnit.id);
    else updates.push({ unitId: fileUnit.id, text, sourceHash: current.sourceHash });
  }
  return problems.length > 0 ? { ok: false, problems } : { ok: true, updates, unchanged, warnings };
}
