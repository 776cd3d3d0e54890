import type { ApiErrorBody } from '@mantlepiece/shared';

type FieldError = NonNullable<ApiErrorBody['errors']>[number];

/** What stops a release, in the order a technician deals with it: the revisions chosen, then translations, image rights, other preflight blockers. */
export const PROBLEM_GROUPS = ['revisions', 'translations', 'rights', 'preflight'] as const;
export type ProblemGroup = (typeof PROBLEM_GROUPS)[number];

export interface ProblemSection {
  group: ProblemGroup;
  messages: string[];
}

/** Preflight checks about image rights (shared/src/preflight); the server names the check in the path's second segment. */
const RIGHTS_CHECKS: ReadonlySet<unknown> = new Set(['image-licence-expiry', 'image-licence-recorded', 'image-credit']);

function groupOf(error: FieldError): ProblemGroup {
  const [head, check] = error.path;
  if (head === 'locales') return 'translations';
  if (head === 'preflight') return RIGHTS_CHECKS.has(check) ? 'rights' : 'preflight';
  return 'revisions';
}

/** The 422 of a release request as sections of plain sentences, empty sections left out. */
export function groupReleaseProblems(errors: readonly FieldError[]): ProblemSection[] {
  return PROBLEM_GROUPS.map((group) => ({ group, messages: errors.filter((error) => groupOf(error) === group).map((error) => error.message) }))
    .filter((section) => section.messages.length > 0);
}
