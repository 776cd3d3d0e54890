import type { TranslationUnit, UnitRun } from './translation-unit.js';

export interface PlaceholderProblem {
  placeholderId: string;
  message: string;
}

/**
 * Placeholders in a translation may move and swap order, but every one the source has must be
 * there exactly once, pairs must open before they close and nest inside each other, and nothing
 * may be added. Returns each problem in words a translator can act on; empty when all is well.
 */
export function checkPlaceholders(source: Pick<TranslationUnit, 'placeholders'>, targetRuns: readonly UnitRun[]): PlaceholderProblem[] {
  const kinds = new Map(source.placeholders.map((placeholder) => [placeholder.id, placeholder.kind]));
  const problems: PlaceholderProblem[] = [];
  const seen = new Set<string>();
  const open: string[] = [];
  const add = (placeholderId: string, message: string) => problems.push({ placeholderId, message });

  for (const run of targetRuns) {
    if (run.type === 'text') continue;
    const kind = kinds.get(run.id);
    if (kind === undefined) {
      add(run.id, `Placeholder {${run.id}} is not in the source; remove it.`);
      continue;
    }
    if (run.type === 'close') {
      if (kind !== 'paired') add(run.id, `Placeholder {${run.id}} stands alone in the source and has no closing {/${run.id}}.`);
      else if (!open.includes(run.id)) add(run.id, `{/${run.id}} closes before its {${run.id}} opens.`);
      else if (open.at(-1) !== run.id) add(run.id, `{/${run.id}} closes while {${open.at(-1)}} inside it is still open; close the inner one first.`);
      else open.pop();
      continue;
    }
    if (seen.has(run.id)) {
      add(run.id, `Placeholder {${run.id}} appears more than once; the source has it once.`);
      continue;
    }
    seen.add(run.id);
    if (run.type === 'open' && kind !== 'paired') add(run.id, `Placeholder {${run.id}} stands alone in the source and cannot enclose text.`);
    else if (run.type === 'standalone' && kind === 'paired') add(run.id, `Placeholder {${run.id}} encloses text in the source and needs its closing {/${run.id}}.`);
    else if (run.type === 'open') open.push(run.id);
  }
  for (const id of open) {
    if (!problems.some((problem) => problem.placeholderId === id)) add(id, `{${id}} is never closed; add {/${id}}.`);
  }
  for (const placeholder of source.placeholders) {
    if (!seen.has(placeholder.id)) add(placeholder.id, `Placeholder {${placeholder.id}} is missing; every placeholder in the source must stay.`);
  }
  return problems;
}
