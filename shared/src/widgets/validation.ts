import { z } from '../zod.js';
import type { WidgetIssue, WidgetValidation } from './types.js';

const englishNumber = new Intl.NumberFormat('en', { maximumSignificantDigits: 6 });

export const formatLimit = (value: number): string =>
  Math.abs(value) > 1e6 || (value !== 0 && Math.abs(value) < 1e-3)
    ? value.toExponential().replace(/e\+?/, ' × 10^')
    : englishNumber.format(value);

export interface NumberRange {
  /** What the curator sees on the form, e.g. "Mass". */
  label: string;
  /** SI symbol, or '' for a pure number such as a friction coefficient. */
  unit: string;
  min: number;
  max: number;
  /** The minimum itself is not allowed (mass > 0). */
  minExclusive?: boolean;
  integer?: boolean;
  /** Why the range stops where it does, in a few words a curator understands. */
  reason?: string;
}

const withUnit = (value: number, unit: string) =>
  unit === '' || unit === '°' ? `${formatLimit(value)}${unit}` : `${formatLimit(value)} ${unit}`;

/** "Mass must be a number more than 0 kg and at most 1,000,000 kg." — the same words for every way of getting it wrong. */
export function rangeMessage(range: NumberRange): string {
  const kind = range.integer ? 'a whole number' : 'a number';
  const span = range.minExclusive
    ? `more than ${withUnit(range.min, range.unit)} and at most ${withUnit(range.max, range.unit)}`
    : `from ${withUnit(range.min, range.unit)} to ${withUnit(range.max, range.unit)}`;
  return `${range.label} must be ${kind} ${span}${range.reason ? ` (${range.reason})` : ''}.`;
}

/** A number field whose every failure (missing, wrong type, out of range) names the allowed range and unit. */
export function boundedNumber(range: NumberRange) {
  const error = rangeMessage(range);
  const base = range.integer ? z.int({ error }) : z.number({ error });
  const lower = range.minExclusive ? base.gt(range.min, { error }) : base.gte(range.min, { error });
  return lower.lte(range.max, { error }).meta({ title: range.label, unit: range.unit });
}

function toWidgetIssues(issues: z.core.$ZodIssue[], widgetName: string): WidgetIssue[] {
  return issues.flatMap((issue): WidgetIssue[] => {
    const path = issue.path.map(String);
    if (issue.code === 'unrecognized_keys') {
      return issue.keys.map((key) => ({ path: [...path, key], message: `"${key}" is not a setting of the ${widgetName}.` }));
    }
    if (issue.code === 'invalid_type' && issue.expected === 'object') {
      return [{ path, message: `The ${widgetName}'s settings must be a set of named values.` }];
    }
    return [{ path, message: issue.message }];
  });
}

/** Runs a widget schema without ever throwing, turning zod's issues into curator-facing ones. */
export function validateWith<P>(schema: z.ZodType<P>, input: unknown, widgetName: string): WidgetValidation<P> {
  try {
    const parsed = schema.safeParse(input);
    return parsed.success ? { ok: true, params: parsed.data } : { ok: false, errors: toWidgetIssues(parsed.error.issues, widgetName) };
  } catch {
    // Only hostile input gets here (a getter or proxy that throws while being read).
    return { ok: false, errors: [{ path: [], message: `The ${widgetName}'s settings could not be read.` }] };
  }
}

const OTHER_RULES_ISSUES = new Set(['unrecognized_keys', 'custom']);

interface RulePayload {
  value: unknown;
  issues: readonly { code?: string; path?: readonly PropertyKey[] }[];
}

/**
 * A cross-field rule runs once the settings it reads are each valid on their own, so each problem
 * is reported once, while a wrong setting elsewhere does not hide it: the form shows every problem
 * at its field in one go. An unknown extra setting or another cross-field rule's finding never stops a rule.
 */
export function whenFieldsValid(...fields: string[]) {
  const reads = new Set(fields);
  return {
    when: ({ value, issues }: RulePayload) =>
      typeof value === 'object' &&
      value !== null &&
      !issues.some((issue) => !OTHER_RULES_ISSUES.has(issue.code ?? '') && (!issue.path?.length || reads.has(String(issue.path[0])))),
  };
}
