import { decide, type RevisionCan, type RevisionState, type StoryState, type Verdict } from '@mantlepiece/shared';
import type { Person } from '../auth/policy.js';
import { talksAbout } from '../comments/comment-policy.js';

/** What a revision's `can` depends on besides the person. */
export interface RevisionFacts {
  state: RevisionState;
  storyState: StoryState;
  /** Null when the submitter's account is gone. */
  authorId: number | null;
  /** Educators who approved it already. */
  approverIds: readonly (number | null)[];
  requiredApprovals: number;
  /** Preflight blockers frozen with it; an approval counts only without them. */
  blockers: number;
}

/**
 * The revision policy: a verdict is the shared `decide`, as the review service applies it, on the
 * open revision; a note is what the request brings, not a permission, so its absence does not
 * close `requestChanges`. Commenting is the comment policy's.
 */
export function revisionCan(person: Person, revision: RevisionFacts): RevisionCan {
  const verdict = (action: Verdict) => {
    if (revision.state !== 'open') return false;
    const decision = decide({
      state: revision.storyState,
      action,
      actor: person,
      // A deleted account is nobody: 0 matches no person's id.
      revision: { authorId: revision.authorId ?? 0, approvals: revision.approverIds.map((id) => ({ educatorId: id ?? 0 })) },
      requiredApprovals: revision.requiredApprovals,
      note: null,
    });
    return decision.ok || decision.reason === 'note_required';
  };
  return { approve: verdict('approve') && revision.blockers === 0, requestChanges: verdict('request_changes'), comment: talksAbout(person) };
}
