import { STORY_WORKFLOW, type CommentCan, type Role } from '@mantlepiece/shared';
import { holdsAny, type Person } from '../auth/policy.js';

/** Who talks about a revision: its curators and its educators. */
export const COMMENTERS: readonly Role[] = ['curator', 'educator'];

/** Whether the person may comment on a revision and reply to its comments (at the story's venue). */
export const talksAbout = (person: Person): boolean => holdsAny(person, COMMENTERS);

/**
 * The comment policy: a commenter may reply to any comment; a comment is resolved or reopened by
 * its author or by a reviewer of the revision (who gives verdicts at the story's venue).
 */
export function commentCan(person: Person, comment: { authorId: number | null }): CommentCan {
  const talks = talksAbout(person);
  return { reply: talks, resolve: talks && (comment.authorId === person.id || holdsAny(person, STORY_WORKFLOW.approve.roles)) };
}
