import type { Role } from '../auth/roles.js';
import type { StoryState } from '../authoring/views.js';

/** What a person can do to a story's review state. */
export const STORY_ACTIONS = ['submit', 'withdraw', 'approve', 'request_changes', 'revise', 'retire'] as const;
export type StoryAction = (typeof STORY_ACTIONS)[number];

export interface StoryMove {
  /** Any one of these roles may take the action. */
  roles: readonly Role[];
  from: readonly StoryState[];
  to: StoryState;
  /** A verdict asking for changes must say what to change. */
  noteRequired: boolean;
}

/**
 * The story workflow as data, so the server, the studio's buttons and the tests read one table.
 * - submit leaves the states in which the curator writes (Draft, Changes requested) and In review
 *   (the new submission supersedes the open one). It also leaves Retired: bringing a story back
 *   goes through review again, since licences and science may have aged while it was off the
 *   screens. That is why there is no direct "unretire" back to Approved. An Approved story is
 *   revised first, since its editor is closed.
 * - withdraw takes a submission back to Draft while no educator has given a verdict on it.
 * - revise opens a Draft from an Approved story's latest revision; the approved revision stays
 *   what releases use until a newer one is approved.
 * - approve moves to Approved only once the venue's required number of approvals is reached;
 *   before that the story stays In review (see `decide`).
 */
export const STORY_WORKFLOW: Readonly<Record<StoryAction, StoryMove>> = {
  submit: { roles: ['curator'], from: ['draft', 'in_review', 'changes_requested', 'retired'], to: 'in_review', noteRequired: false },
  withdraw: { roles: ['curator'], from: ['in_review'], to: 'draft', noteRequired: false },
  approve: { roles: ['educator'], from: ['in_review'], to: 'approved', noteRequired: false },
  request_changes: { roles: ['educator'], from: ['in_review'], to: 'changes_requested', noteRequired: true },
  revise: { roles: ['curator'], from: ['approved'], to: 'draft', noteRequired: false },
  retire: { roles: ['curator', 'admin'], from: ['approved'], to: 'retired', noteRequired: false },
};

/** The states in which the curator writes; in every other state the editor is closed. */
export const EDITABLE_STORY_STATES: readonly StoryState[] = ['draft', 'changes_requested'];

/** Whether these roles may take `action` on a story in `state`, before any rule about its revision. */
export const mayTake = (action: StoryAction, roles: readonly Role[], state: StoryState): boolean =>
  STORY_WORKFLOW[action].roles.some((role) => roles.includes(role)) && STORY_WORKFLOW[action].from.includes(state);

/** The glossary's names of the states, for messages. */
export const STORY_STATE_LABELS: Readonly<Record<StoryState, string>> = {
  draft: 'Draft',
  in_review: 'In review',
  changes_requested: 'Changes requested',
  approved: 'Approved',
  retired: 'Retired',
};

const ACTION_WORDS: Readonly<Record<StoryAction, { verb: string; done: string }>> = {
  submit: { verb: 'submit a story for review', done: 'submitted for review' },
  withdraw: { verb: 'withdraw a submission', done: 'withdrawn from review' },
  approve: { verb: 'approve a story', done: 'approved' },
  request_changes: { verb: 'ask for changes to a story', done: 'sent back with changes requested' },
  revise: { verb: 'revise an approved story', done: 'revised' },
  retire: { verb: 'retire a story', done: 'retired' },
};

const ROLE_NAMES: Readonly<Record<Role, string>> = {
  admin: 'an admin',
  curator: 'a curator',
  educator: 'an educator',
  translator: 'a translator',
  technician: 'a technician',
};

export interface WorkflowActor {
  id: number;
  roles: readonly Role[];
}

/** The open revision's facts that a verdict depends on. */
export interface OpenRevision {
  authorId: number;
  /** Approvals already recorded on this revision, not counting the one being decided. */
  approvals: readonly { educatorId: number }[];
}

export interface WorkflowRequest {
  state: StoryState;
  action: StoryAction;
  actor: WorkflowActor;
  /** The revision under review; null when there is none (a story never submitted). */
  revision: OpenRevision | null;
  /** The venue's setting: how many different educators must approve a revision (1 unless set). */
  requiredApprovals?: number;
  note?: string | null;
}

export type WorkflowRefusal = 'illegal_move' | 'forbidden' | 'self_approval' | 'note_required' | 'duplicate_approver' | 'has_verdict';

export type WorkflowDecision = { ok: true; next: StoryState } | { ok: false; reason: WorkflowRefusal; message: string };

const refuse = (reason: WorkflowRefusal, message: string): WorkflowDecision => ({ ok: false, reason, message });

const list = (items: readonly string[]) => (items.length <= 1 ? items.join('') : `${items.slice(0, -1).join(', ')} or ${items[items.length - 1]}`);

/**
 * Decides one workflow step without touching storage: the server maps `forbidden` and
 * `self_approval` to 403, `illegal_move`, `duplicate_approver` and `has_verdict` to 409,
 * `note_required` to 400.
 * Who may act is checked before where the story is, so a person without the role gets the same
 * 403 whatever state the story is in.
 */
export function decide({ state, action, actor, revision, requiredApprovals = 1, note }: WorkflowRequest): WorkflowDecision {
  if (!Number.isInteger(requiredApprovals) || requiredApprovals < 1) throw new RangeError(`requiredApprovals must be a whole number of at least 1, not ${requiredApprovals}.`);
  const move = STORY_WORKFLOW[action];
  const current = STORY_STATE_LABELS[state];
  if (!move.roles.some((role) => actor.roles.includes(role))) {
    return refuse('forbidden', `Only ${list(move.roles.map((role) => ROLE_NAMES[role]))} can ${ACTION_WORDS[action].verb}; this story stays ${current}.`);
  }
  if (!move.from.includes(state)) {
    return refuse('illegal_move', `This story is ${current}; only a story that is ${list(move.from.map((from) => STORY_STATE_LABELS[from]))} can be ${ACTION_WORDS[action].done}.`);
  }
  if (move.noteRequired && !note?.trim()) {
    return refuse('note_required', `Say what should change: a request for changes needs a note. This story stays ${current}.`);
  }
  if (action === 'withdraw') {
    if (!revision) return refuse('illegal_move', `This story is ${current} but has no open submission to withdraw.`);
    // An open revision's only verdicts are approvals: a request for changes closes it.
    if (revision.approvals.length > 0) {
      return refuse('has_verdict', `An educator has already given a verdict on this submission, so it can no longer be withdrawn. This story stays ${current}.`);
    }
  }
  if (action !== 'approve') return { ok: true, next: move.to };

  if (!revision) return refuse('illegal_move', `This story is ${current} but has no open revision to approve.`);
  if (revision.authorId === actor.id) {
    return refuse('self_approval', `You cannot approve a revision you submitted yourself; another educator must approve it. This story stays ${current}.`);
  }
  if (revision.approvals.some((approval) => approval.educatorId === actor.id)) {
    return refuse('duplicate_approver', `You have already approved this revision; it needs an approval from a different educator. This story stays ${current}.`);
  }
  return { ok: true, next: revision.approvals.length + 1 >= requiredApprovals ? move.to : state };
}
