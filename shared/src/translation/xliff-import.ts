import { checkPlaceholders } from './check-placeholders.js';
import { displayOf, type TranslationUnit } from './translation-unit.js';
import type { StoredTranslation } from './unit-status.js';
import type { XliffParse, XliffProblem } from './xliff-parse.js';

export interface XliffUpdate {
  unitId: string;
  /** The translation in the display form, ready to store. */
  text: string;
  sourceHash: string;
}

export type XliffImportPlan =
  | { ok: true; updates: XliffUpdate[]; unchanged: string[] }
  | { ok: false; problems: XliffProblem[] };

export interface PlanXliffImportOptions {
  parsed: XliffParse;
  expected: { srcLang: string; trgLang: string };
  currentUnits: readonly TranslationUnit[];
  currentTranslations?: Readonly<Record<string, StoredTranslation>>;
}

function sameLanguage(a: string | undefined, b: string): boolean {
  if (a === undefined) return false;
  try {
    const [left] = Intl.getCanonicalLocales(a);
    const [right] = Intl.getCanonicalLocales(b);
    return left === right;
  } catch {
    return false;
  }
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
  const problems: XliffProblem[] = [];
  if (!sameLanguage(xliff.srcLang, expected.srcLang)) problems.push({ message: `The file's source language is ${xliff.srcLang}; this story is written in ${expected.srcLang}.` });
  if (!sameLanguage(xliff.trgLang, expected.trgLang)) problems.push({ message: `The file's target language is ${xliff.trgLang ?? '(none)'}; this upload is for ${expected.trgLang}.` });

  const byId = new Map(currentUnits.map((unit) => [unit.id, unit]));
  const updates: XliffUpdate[] = [];
  const unchanged: string[] = [];
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
    const existing = Object.hasOwn(currentTranslations, fileUnit.id) ? currentTranslations[fileUnit.id] : undefined;
    if (text === '' || (existing?.text === text && existing.sourceHash === current.sourceHash)) unchanged.push(fileUnit.id);
    else updates.push({ unitId: fileUnit.id, text, sourceHash: current.sourceHash });
  }
  return problems.length > 0 ? { ok: false, problems } : { ok: true, updates, unchanged };
}
