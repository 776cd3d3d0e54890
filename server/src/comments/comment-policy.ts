import type { CommentCan, Role } from '@mantlepiece/shared';
import { holdsAny, type Person } from '../auth/policy.js';

/** Who talks about a revision: its curators and its educators. */
export const COMMENTERS: readonly Role[] = ['curator', 'educator'];

/** The comment policy: a commenter may reply to any comment and resolve or reopen it, on any revision. */
export function commentCan(person: Person): CommentCan {
  const talks = holdsAny(person, COMMENTERS);
  return { reply: talks, resolve: talks };
}
