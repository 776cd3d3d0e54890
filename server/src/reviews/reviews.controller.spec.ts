import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role, StoryState } from '@mantlepiece/shared';
import { paragraphDoc } from '../../test/authoring-fixtures.js';
import { createReviewApp, member, reviewVenue, storyWithPanels, submit, verdict, type Headers } from '../../test/review-fixtures.js';
import type { TestApp } from '../../test/test-app.js';

let t: TestApp;
let exhibitId: number;
let venueId: number;
let admin: Headers;
const callers = {} as Record<Role, Headers>;
let approver: Headers;

beforeAll(async () => {
  t = await createReviewApp();
  const venue = await reviewVenue(t, 'workflow');
  ({ admin } = venue);
  exhibitId = venue.exhibit.id;
  venueId = venue.venue.id;
  for (const role of ['admin', 'curator', 'educator', 'translator', 'technician'] as const) callers[role] = (await member(t, [role])).auth;
  approver = (await member(t, ['educator'])).auth;
});
afterAll(() => t.close());

/** A story brought to `state` through the API; `revisionId` is its newest revision. */
async function storyIn(state: StoryState): Promise<{ storyId: number; revisionId: number | null }> {
  const curator = callers.curator;
  const { storyId } = await storyWithPanels(t, curator, exhibitId);
  if (state === 'draft') return { storyId, revisionId: null };
  const { revisionId } = await submit(t, curator, storyId);
  if (state === 'changes_requested') await verdict(t, approver, revisionId, { verdict: 'request_changes', note: 'Say what the arrows mean.' });
  if (state === 'approved' || state === 'retired') await verdict(t, approver, revisionId, { verdict: 'approve' });
  if (state === 'retired') await request(t.http).post(`/api/stories/${storyId}/retire`).set(curator);
  return { storyId, revisionId };
}

type Action = 'submit' | 'withdraw' | 'approve' | 'request_changes' | 'revise' | 'retire';

function act(action: Action, role: Role, story: { storyId: number; revisionId: number | null }) {
  const auth = callers[role];
  if (action === 'submit') return request(t.http).post(`/api/stories/${story.storyId}/submit`).set(auth);
  if (action === 'retire' || action === 'withdraw' || action === 'revise') return request(t.http).post(`/api/stories/${story.storyId}/${action}`).set(auth);
  return verdict(t, auth, story.revisionId!, action === 'approve' ? { verdict: 'approve' } : { verdict: 'request_changes', note: 'Shorter sentences, please.' });
}

const ROLES_TRIED: Role[] = ['curator', 'educator', 'admin', 'translator', 'technician'];
const only = (allowed: Partial<Record<Role, number>>): Record<Role, number> =>
  Object.fromEntries(ROLES_TRIED.map((role) => [role, allowed[role] ?? 403])) as Record<Role, number>;

/**
 * (state, action) → expected status per role, and the state after a success. A draft has no
 * revision, so a verdict on a draft cannot even be addressed: those cells are not reachable.
 */
const TABLE: [StoryState, Action, Record<Role, number>, StoryState | null][] = [
  ['draft', 'submit', only({ curator: 201 }), 'in_review'],
  ['draft', 'retire', only({ curator: 409, admin: 409 }), null],
  ['draft', 'withdraw', only({ curator: 409 }), null],
  ['draft', 'revise', only({ curator: 409 }), null],
  ['in_review', 'submit', only({ curator: 201 }), 'in_review'],
  ['in_review', 'withdraw', only({ curator: 200 }), 'draft'],
  ['in_review', 'revise', only({ curator: 409 }), null],
  ['in_review', 'approve', only({ educator: 201 }), 'approved'],
  ['in_review', 'request_changes', only({ educator: 201 }), 'changes_requested'],
  ['in_review', 'retire', only({ curator: 409, admin: 409 }), null],
  ['changes_requested', 'submit', only({ curator: 201 }), 'in_review'],
  ['changes_requested', 'approve', only({ educator: 409 }), null],
  ['changes_requested', 'request_changes', only({ educator: 409 }), null],
  ['changes_requested', 'retire', only({ curator: 409, admin: 409 }), null],
  ['changes_requested', 'withdraw', only({ curator: 409 }), null],
  ['approved', 'submit', only({ curator: 409 }), null],
  ['approved', 'withdraw', only({ curator: 409 }), null],
  ['approved', 'revise', only({ curator: 200 }), 'draft'],
  ['approved', 'approve', only({ educator: 409 }), null],
  ['approved', 'request_changes', only({ educator: 409 }), null],
  ['approved', 'retire', only({ curator: 200, admin: 200 }), 'retired'],
  ['retired', 'submit', only({ curator: 201 }), 'in_review'],
  ['retired', 'approve', only({ educator: 409 }), null],
  ['retired', 'request_changes', only({ educator: 409 }), null],
  ['retired', 'retire', only({ curator: 409, admin: 409 }), null],
  ['retired', 'revise', only({ curator: 409 }), null],
];

describe('the story workflow through the API', () => {
  describe.each(TABLE)('a story %s, action %s', (state, action, expected, after) => {
    it.each(ROLES_TRIED)('by %s', async (role) => {
      const story = await storyIn(state);
      const res = await act(action, role, story);
      expect({ role, status: res.status }).toEqual({ role, status: expected[role] });
      const now = (await request(t.http).get(`/api/stories/${story.storyId}`).set(callers.curator)).body.state;
      expect(now).toBe(res.status < 300 ? after : state);
      if (res.status === 409) expect(res.body.message).toMatch(/Draft|In review|Changes requested|Approved|Retired|superseded|approved|changes requested/);
    });
  });
});

describe('verdicts', () => {
  it('refuses an approval by the revision’s own author with 403, even when they are also an educator', async () => {
    const both = await member(t, ['curator', 'educator']);
    const { storyId } = await storyWithPanels(t, both.auth, exhibitId);
    const { revisionId } = await submit(t, both.auth, storyId);
    const res = await verdict(t, both.auth, revisionId, { verdict: 'approve' });
    expect(res.status).toBe(403);
    expect(res.body.message).toMatch(/cannot approve a revision you submitted/);
  });

  it('needs a note to ask for changes (400 naming the field), blank or missing alike', async () => {
    const { storyId } = await storyWithPanels(t, callers.curator, exhibitId);
    const { revisionId } = await submit(t, callers.curator, storyId);
    for (const body of [{ verdict: 'request_changes' }, { verdict: 'request_changes', note: '   ' }]) {
      const res = await verdict(t, approver, revisionId, body);
      expect(res.status).toBe(400);
      expect(res.body.errors).toEqual([{ path: ['note'], message: expect.stringMatching(/needs a note/) }]);
    }
    const ok = await verdict(t, approver, revisionId, { verdict: 'request_changes', note: '  Name the plates.  ' });
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ review: { verdict: 'request_changes', note: 'Name the plates.', reviewer: { id: expect.any(Number) } }, storyState: 'changes_requested' });
  });

  it('refuses a verdict on a superseded revision with 409, naming its state', async () => {
    const { storyId } = await storyWithPanels(t, callers.curator, exhibitId);
    const first = await submit(t, callers.curator, storyId);
    await submit(t, callers.curator, storyId);
    const res = await verdict(t, approver, first.revisionId, { verdict: 'approve' });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/superseded/);
  });

  describe('when the venue requires two approvals', () => {
    beforeAll(async () => {
      const res = await request(t.http).patch(`/api/venues/${venueId}`).set(admin).send({ requiredApprovals: 2 });
      expect(res.body.requiredApprovals).toBe(2);
    });
    afterAll(async () => {
      await request(t.http).patch(`/api/venues/${venueId}`).set(admin).send({ requiredApprovals: 1 });
    });

    it('stays In review after one approval, refuses the same educator twice, and is Approved by a second educator', async () => {
      const { storyId } = await storyWithPanels(t, callers.curator, exhibitId);
      const { revisionId } = await submit(t, callers.curator, storyId);
      const first = await verdict(t, approver, revisionId, { verdict: 'approve' });
      expect(first.body.storyState).toBe('in_review');

      const queue = await request(t.http).get('/api/reviews/queue?pageSize=100&sort=-submittedAt').set(approver);
      expect(queue.body.items.find((item: { revisionId: number }) => item.revisionId === revisionId)).toMatchObject({ approvals: 1, requiredApprovals: 2, storyId });

      const again = await verdict(t, approver, revisionId, { verdict: 'approve' });
      expect(again.status).toBe(409);
      expect(again.body.message).toMatch(/already approved/);

      const second = await verdict(t, callers.educator, revisionId, { verdict: 'approve' });
      expect(second.status).toBe(201);
      expect(second.body.storyState).toBe('approved');
      const revisions = await request(t.http).get(`/api/stories/${storyId}/revisions`).set(callers.curator);
      expect(revisions.body).toEqual([expect.objectContaining({ id: revisionId, number: 1, state: 'approved', approvals: 2, blockers: 0 })]);
    });

    it('refuses a setting other than 1 or 2', async () => {
      const res = await request(t.http).patch(`/api/venues/${venueId}`).set(admin).send({ requiredApprovals: 3 });
      expect(res.status).toBe(400);
      expect(res.body.errors).toEqual([{ path: ['requiredApprovals'], message: 'A revision needs 1 or 2 approvals.' }]);
    });
  });
});

describe('GET /api/reviews/queue', () => {
  it('lists open revisions only, searched by title and paged in the database', async () => {
    const marker = `Queue ${Math.random().toString(36).slice(2, 8)}`;
    const ids: number[] = [];
    for (const suffix of ['a', 'b', 'c']) {
      const story = await request(t.http).post('/api/stories').set(callers.curator).send({ title: `${marker} ${suffix}`, exhibitId });
      await request(t.http).post(`/api/stories/${story.body.id}/panels`).set(callers.curator).send({ doc: paragraphDoc('Plates move a few centimetres a year.') });
      ids.push((await submit(t, callers.curator, story.body.id)).revisionId);
    }
    await verdict(t, approver, ids[2]!, { verdict: 'approve' });
    const page1 = await request(t.http).get(`/api/reviews/queue?q=${encodeURIComponent(marker)}&pageSize=1&sort=-storyTitle`).set(approver);
    const page2 = await request(t.http).get(`/api/reviews/queue?q=${encodeURIComponent(marker)}&pageSize=1&page=2&sort=-storyTitle`).set(approver);
    expect(page1.body).toMatchObject({ total: 2, page: 1, pageSize: 1 });
    expect([page1.body.items[0].storyTitle, page2.body.items[0].storyTitle]).toEqual([`${marker} b`, `${marker} a`]);
    expect(page1.body.items[0]).toMatchObject({ revisionId: ids[1], number: 1, approvals: 0, requiredApprovals: 1, blockers: 0, submittedBy: { id: expect.any(Number) } });
  });
});
