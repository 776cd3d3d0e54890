import { describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../auth/roles.js';
import { STORY_STATES, type StoryState } from '../authoring/views.js';
import { decide, STORY_ACTIONS, STORY_STATE_LABELS, type StoryAction, type WorkflowRefusal } from './story-workflow.js';

// The rules of issue 5 ("Workflow"), written out cell by cell rather than read back from STORY_WORKFLOW.
// A cell is the next state, or the refusal. Every actor here is someone other than the revision's
// author, no one has approved yet, one approval is required, and a note is given.
type Outcome = StoryState | WorkflowRefusal;
const F: Outcome = 'forbidden';
const I: Outcome = 'illegal_move';

// Columns: draft, in_review, changes_requested, approved, retired.
type Row = [Outcome, Outcome, Outcome, Outcome, Outcome];
/** A role that may not take the action, whatever the state. */
const NEVER: Row = [F, F, F, F, F];
const EXPECTED: Record<StoryAction, Record<Role, Row>> = {
  submit: {
    admin: NEVER,
    curator: ['in_review', 'in_review', 'in_review', I, 'in_review'],
    educator: NEVER,
    translator: NEVER,
    technician: NEVER,
  },
  withdraw: {
    admin: NEVER,
    curator: [I, 'draft', I, I, I],
    educator: NEVER,
    translator: NEVER,
    technician: NEVER,
  },
  approve: {
    admin: NEVER,
    curator: NEVER,
    educator: [I, 'approved', I, I, I],
    translator: NEVER,
    technician: NEVER,
  },
  request_changes: {
    admin: NEVER,
    curator: NEVER,
    educator: [I, 'changes_requested', I, I, I],
    translator: NEVER,
    technician: NEVER,
  },
  revise: {
    admin: NEVER,
    curator: [I, I, I, 'draft', I],
    educator: NEVER,
    translator: NEVER,
    technician: NEVER,
  },
  retire: {
    admin: [I, I, I, 'retired', I],
    curator: [I, I, I, 'retired', I],
    educator: NEVER,
    translator: NEVER,
    technician: NEVER,
  },
};

const COLUMNS: StoryState[] = ['draft', 'in_review', 'changes_requested', 'approved', 'retired'];
const AUTHOR = 1;
const ACTOR = 2;

const cells = STORY_ACTIONS.flatMap((action) =>
  ROLES.flatMap((role) => COLUMNS.map((state, column) => ({ state, action, role, expected: EXPECTED[action][role][column]! }))),
);

const outcomeOf = (decision: ReturnType<typeof decide>): Outcome => (decision.ok ? decision.next : decision.reason);

describe('story workflow: every (state, action, role)', () => {
  it('covers every state, action and role of the product', () => {
    expect([...COLUMNS].sort()).toEqual([...STORY_STATES].sort());
    expect(Object.keys(EXPECTED).sort()).toEqual([...STORY_ACTIONS].sort());
    expect(cells).toHaveLength(STORY_STATES.length * STORY_ACTIONS.length * ROLES.length);
  });

  it.each(cells)('$action by a $role on a $state story → $expected', ({ state, action, role, expected }) => {
    const decision = decide({ state, action, actor: { id: ACTOR, roles: [role] }, revision: { authorId: AUTHOR, approvals: [] }, note: 'Check the date on panel 2.' });
    expect(outcomeOf(decision)).toBe(expected);
    if (!decision.ok) expect(decision.message).toContain(STORY_STATE_LABELS[state]);
  });
});

describe('story workflow: verdict rules', () => {
  const educator = { id: ACTOR, roles: ['educator'] as Role[] };
  const inReview = { state: 'in_review' as const, revision: { authorId: AUTHOR, approvals: [] } };

  it('refuses a request for changes without a note, or with only spaces', () => {
    for (const note of [undefined, null, '', '   \n']) {
      const decision = decide({ ...inReview, action: 'request_changes', actor: educator, note });
      expect(decision).toMatchObject({ ok: false, reason: 'note_required' });
    }
  });

  it('accepts an approval without a note', () => {
    expect(decide({ ...inReview, action: 'approve', actor: educator })).toEqual({ ok: true, next: 'approved' });
  });

  it("refuses an approval by the revision's own author, even one who is also an educator", () => {
    const author = { id: AUTHOR, roles: ['curator', 'educator'] as Role[] };
    const decision = decide({ ...inReview, action: 'approve', actor: author });
    expect(decision).toMatchObject({ ok: false, reason: 'self_approval' });
    expect(decision.ok ? '' : decision.message).toContain('In review');
  });

  it('lets a curator who is also an educator approve someone else\'s revision', () => {
    expect(decide({ ...inReview, action: 'approve', actor: { id: ACTOR, roles: ['curator', 'educator'] } })).toEqual({ ok: true, next: 'approved' });
  });

  it('keeps the story in review after the first of two required approvals, and approves on the second from a different educator', () => {
    const first = decide({ ...inReview, action: 'approve', actor: educator, requiredApprovals: 2 });
    expect(first).toEqual({ ok: true, next: 'in_review' });
    const second = decide({
      state: 'in_review',
      action: 'approve',
      actor: { id: 3, roles: ['educator'] },
      revision: { authorId: AUTHOR, approvals: [{ educatorId: ACTOR }] },
      requiredApprovals: 2,
    });
    expect(second).toEqual({ ok: true, next: 'approved' });
  });

  it('refuses a second approval by the same educator', () => {
    const decision = decide({
      state: 'in_review',
      action: 'approve',
      actor: educator,
      revision: { authorId: AUTHOR, approvals: [{ educatorId: ACTOR }] },
      requiredApprovals: 2,
    });
    expect(decision).toMatchObject({ ok: false, reason: 'duplicate_approver' });
  });

  it('refuses an approval when there is no open revision', () => {
    expect(decide({ state: 'in_review', action: 'approve', actor: educator, revision: null })).toMatchObject({ ok: false, reason: 'illegal_move' });
  });

  it('names the current state and the states the move needs in an illegal-move message', () => {
    const decision = decide({ state: 'approved', action: 'approve', actor: educator, revision: null });
    expect(decision).toEqual({ ok: false, reason: 'illegal_move', message: 'This story is Approved; only a story that is In review can be approved.' });
  });

  it('refuses to withdraw a submission an educator has already approved, since that verdict counts', () => {
    const curator = { id: AUTHOR, roles: ['curator'] as Role[] };
    const approved = decide({ state: 'in_review', action: 'withdraw', actor: curator, revision: { authorId: AUTHOR, approvals: [{ educatorId: ACTOR }] }, requiredApprovals: 2 });
    expect(approved).toMatchObject({ ok: false, reason: 'has_verdict' });
    expect(decide({ state: 'in_review', action: 'withdraw', actor: curator, revision: null })).toMatchObject({ ok: false, reason: 'illegal_move' });
  });

  it('refuses a required-approvals setting below one', () => {
    expect(() => decide({ ...inReview, action: 'approve', actor: educator, requiredApprovals: 0 })).toThrow(RangeError);
  });
});
