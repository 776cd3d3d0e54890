import type { CommentView, PersonRef, ReviewView, RevisionCan, RevisionSummary, RevisionView } from '@mantlepiece/shared';
import type { User } from '../users/models/user.model.js';
import type { Revision } from './models/revision.model.js';

export const personRef = (person: User | null | undefined): PersonRef | null => (person ? { id: person.id, name: person.name } : null);

/** `revision` with its submitter and the `approvals` count column. */
export const toRevisionSummary = (revision: Revision): RevisionSummary => ({
  id: revision.id,
  number: revision.number,
  hash: revision.hash,
  state: revision.state,
  submittedAt: revision.submittedAt.toISOString(),
  submittedBy: personRef(revision.submittedBy),
  approvals: Number(revision.get('approvals') ?? 0),
  blockers: revision.blockerCount,
});

export interface RevisionParts {
  reviews: ReviewView[];
  comments: CommentView[];
  previousApprovedRevisionId: number | null;
  can: RevisionCan;
}

/** The title is the one submitted, like every other part of the snapshot. */
export const toRevisionView = (revision: Revision, parts: RevisionParts): RevisionView => ({
  id: revision.id,
  storyId: revision.storyId,
  storyTitle: revision.snapshot.story.title,
  number: revision.number,
  hash: revision.hash,
  state: revision.state,
  submittedAt: revision.submittedAt.toISOString(),
  submittedBy: personRef(revision.submittedBy),
  note: revision.note,
  snapshot: revision.snapshot.panels.map((panel) => ({ panelId: panel.id, position: panel.position, docs: panel.docs, wordBudget: panel.wordBudget })),
  preflight: revision.preflight,
  ...parts,
});
