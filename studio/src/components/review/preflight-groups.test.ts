import { describe, expect, it } from 'vitest';
import type { PreflightEntry } from '@mantlepiece/shared';
import { groupPreflight } from './preflight-groups';

const entry = (check: string, severity: PreflightEntry['severity'], passed: boolean, panelId?: number): PreflightEntry => ({
  check,
  severity,
  passed,
  message: `${check} ${passed ? 'passed' : 'failed'}`,
  ...(panelId === undefined ? {} : { panelId }),
});

describe('groupPreflight', () => {
  it('puts failed blockers and failed warnings apart, and every passed check together whatever its severity', () => {
    const entries = [entry('image-alt-text', 'blocker', false, 3), entry('word-budget', 'warning', false, 3), entry('image-credit', 'blocker', true), entry('reading-level', 'warning', true)];
    const groups = groupPreflight(entries);
    expect(groups.blockers.map((e) => e.check)).toEqual(['image-alt-text']);
    expect(groups.warnings.map((e) => e.check)).toEqual(['word-budget']);
    expect(groups.passed.map((e) => e.check)).toEqual(['image-credit', 'reading-level']);
  });
});
