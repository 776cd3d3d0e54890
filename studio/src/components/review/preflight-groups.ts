import type { PreflightEntry } from '@mantlepiece/shared';

export interface PreflightGroups {
  blockers: PreflightEntry[];
  warnings: PreflightEntry[];
  passed: PreflightEntry[];
}

/** A revision's preflight as a reviewer reads it: what stops an approval, what to weigh, what was checked. */
export function groupPreflight(entries: readonly PreflightEntry[]): PreflightGroups {
  return {
    blockers: entries.filter((entry) => !entry.passed && entry.severity === 'blocker'),
    warnings: entries.filter((entry) => !entry.passed && entry.severity === 'warning'),
    passed: entries.filter((entry) => entry.passed),
  };
}
