import { imageAltText } from './image-alt-text.js';
import { imageCredit } from './image-credit.js';
import { imageInLibrary } from './image-in-library.js';
import { imageLicenceExpiry } from './image-licence-expiry.js';
import { imageLicenceRecorded } from './image-licence-recorded.js';
import { livePhraseStateWords } from './live-phrase-state-words.js';
import { livePhraseTarget } from './live-phrase-target.js';
import { liveValueTarget } from './live-value-target.js';
import { panelContent } from './panel-content.js';
import { readingLevelRule } from './reading-level.js';
import { textContrast } from './text-contrast.js';
import type { PreflightContext, PreflightEntry, PreflightRule } from './types.js';
import { widgetModelLimits } from './widget-model-limits.js';
import { widgetParams } from './widget-params.js';
import { wordBudget } from './word-budget.js';

/** Every check a revision gets, blockers first, in the order the review page lists them. */
export const PREFLIGHT_RULES: readonly PreflightRule[] = [
  panelContent,
  widgetParams,
  liveValueTarget,
  livePhraseTarget,
  imageInLibrary,
  imageAltText,
  imageCredit,
  imageLicenceExpiry,
  widgetModelLimits,
  livePhraseStateWords,
  readingLevelRule,
  wordBudget,
  imageLicenceRecorded,
  textContrast,
];

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

function assertDate(value: string | null, what: string): void {
  if (value !== null && !(ISO_DATE.test(value) && !Number.isNaN(Date.parse(`${value}T00:00:00Z`)))) {
    throw new RangeError(`${what} must be a date written YYYY-MM-DD, not ${JSON.stringify(value)}.`);
  }
}

/** Runs every check on a revision: one entry per check, and per panel where the check looks at panels, passed ones included. */
export function runPreflight(context: PreflightContext, rules: readonly PreflightRule[] = PREFLIGHT_RULES): PreflightEntry[] {
  assertDate(context.today, 'Today');
  assertDate(context.exhibitPlannedEnd, "The exhibit's planned end");
  for (const asset of context.media) assertDate(asset.licenceExpiresOn, `The licence expiry of media ${asset.id}`);
  return rules.flatMap((rule) => rule.run(context).map((finding) => ({ check: rule.id, severity: rule.severity, ...finding })));
}

/** The entries that stop an approval (the server answers 422 listing them). */
export const preflightBlockers = (entries: readonly PreflightEntry[]): PreflightEntry[] =>
  entries.filter((entry) => entry.severity === 'blocker' && !entry.passed);
