import { ConflictException, HttpStatus } from '@nestjs/common';
import {
  decide, EDITABLE_STORY_STATES, STORY_STATE_LABELS, STORY_WORKFLOW,
  type Can, type OpenRevision, type Role, type StoryAction, type StoryCan, type StoryState,
} from '@mantlepiece/shared';
import { holdsAny, type Person } from '../auth/policy.js';

/** What a story id of no reachable story answers, one missing or of another venue alike. */
export const NO_SUCH_STORY = 'There is no such story.';

/** Who writes stories: starts them, changes their details and panels, deletes one never released. */
export const STORY_WRITERS: readonly Role[] = ['curator'];

/** What a story's `can` depends on besides the person. */
export interface StoryFacts {
  state: StoryState;
  releasedAt: Date | null;
  panelCount: number;
  /** The submission waiting for verdicts, if any; withdraw depends on its approvals. */
  openRevision: OpenRevision | null;
}

/**
 * The story policy. Workflow moves are the shared `decide`, the rule the review service applies;
 * `submit` also needs a panel, as the service does. Preflight blockers are not part of `can`: they
 * are the draft's preflight, shown while writing, and a submission with blockers is refused 422.
 */
export function storyCan(person: Person, story: StoryFacts): StoryCan {
  const writer = holdsAny(person, STORY_WRITERS);
  const allows = (action: StoryAction) => decide({ state: story.state, action, actor: person, revision: story.openRevision }).ok;
  return {
    edit: writer && isEditable(story.state),
    delete: writer && story.releasedAt === null,
    submit: allows('submit') && story.panelCount > 0,
    withdraw: allows('withdraw'),
    revise: allows('revise'),
    retire: allows('retire'),
  };
}

/** `review`: the approvers of the workflow, whom the review queue's guard lets in. */
export const storiesCan = (person: Person): Can<'stories'> => ({ create: holdsAny(person, STORY_WRITERS), review: holdsAny(person, STORY_WORKFLOW.approve.roles) });

const isEditable = (state: StoryState) => EDITABLE_STORY_STATES.includes(state);

const REOPEN_HINTS: Partial<Record<StoryState, string>> = {
  in_review: 'Withdraw the submission to edit it again.',
  approved: 'Revise it to open a new draft.',
  retired: 'Submit it for review to bring it back.',
};

/**
 * Refuses a change to a story's details or panels outside the states in which the curator writes
 * (409): what an educator reviews, and what a release carries, is what was submitted.
 */
export function refuseUnlessEditable(story: { state: StoryState }): void {
  if (isEditable(story.state)) return;
  const open = EDITABLE_STORY_STATES.map((state) => STORY_STATE_LABELS[state]).join(' or ');
  const message = `This story is ${STORY_STATE_LABELS[story.state]}; its details and panels can be changed only while it is ${open}. ${REOPEN_HINTS[story.state] ?? ''}`.trim();
  throw new ConflictException({ statusCode: HttpStatus.CONFLICT, message, errors: [{ path: ['state'], message }] });
}
