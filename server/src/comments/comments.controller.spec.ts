import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { paragraphDoc } from '../../test/authoring-fixtures.js';
import { createReviewApp, member, reviewVenue, storyWithPanels, submit, type Member } from '../../test/review-fixtures.js';
import type { TestApp } from '../../test/test-app.js';

let t: TestApp;
let curator: Member;
let educator: Member;
let exhibitId: number;

beforeAll(async () => {
  t = await createReviewApp();
  exhibitId = (await reviewVenue(t, 'comments')).exhibit.id;
  curator = await member(t, ['curator'], { name: 'Felix Braun' });
  educator = await member(t, ['educator'], { name: 'Grace Mensah' });
});
afterAll(() => t.close());

const comment = (who: Member, revisionId: number, body: Record<string, unknown>) => request(t.http).post(`/api/revisions/${revisionId}/comments`).set(who.auth).send(body);

describe('comments on a revision', () => {
  it('anchors a comment to a panel and a text range, threads a reply on the same panel, and resolves', async () => {
    const { storyId, panelIds } = await storyWithPanels(t, curator.auth, exhibitId);
    const { revisionId } = await submit(t, curator.auth, storyId);
    const root = await comment(educator, revisionId, { panelId: panelIds[0], range: { from: 0, to: 8, quote: 'Hot rock' }, body: 'How hot?' });
    expect(root.status).toBe(201);
    expect(root.body).toEqual({
      id: expect.any(Number), revisionId, panelId: panelIds[0], range: { from: 0, to: 8, quote: 'Hot rock' }, body: 'How hot?',
      author: { id: educator.person.id, name: 'Grace Mensah' }, parentId: null, resolvedAt: null, resolvedBy: null,
      createdAt: expect.any(String), carriedFromRevisionId: null, anchorChanged: null,
      // The educator who wrote it may answer it and, as a reviewer of the revision, resolve it.
      can: { reply: true, resolve: true },
    });
    const reply = await comment(curator, revisionId, { parentId: root.body.id, body: 'About 1300 °C at the base.' });
    expect(reply.body).toMatchObject({ parentId: root.body.id, panelId: panelIds[0], range: null });

    // Resolved by its author or a reviewer of the revision (issue 13): the curator who answered it is neither.
    expect((await request(t.http).patch(`/api/comments/${root.body.id}`).set(curator.auth).send({ resolved: true })).status).toBe(403);
    const resolved = await request(t.http).patch(`/api/comments/${root.body.id}`).set(educator.auth).send({ resolved: true });
    expect(resolved.body).toMatchObject({ resolvedAt: expect.any(String), resolvedBy: { id: educator.person.id, name: 'Grace Mensah' } });
    const reopened = await request(t.http).patch(`/api/comments/${root.body.id}`).set(educator.auth).send({ resolved: false });
    expect(reopened.body).toMatchObject({ resolvedAt: null, resolvedBy: null });

    const revision = (await request(t.http).get(`/api/revisions/${revisionId}`).set(curator.auth)).body;
    expect(revision.comments.map((c: { id: number }) => c.id)).toEqual([root.body.id, reply.body.id]);
  });

  it('tells the parent comment’s author about a reply, in the studio', async () => {
    const { storyId, panelIds } = await storyWithPanels(t, curator.auth, exhibitId);
    const { revisionId } = await submit(t, curator.auth, storyId);
    const root = await comment(educator, revisionId, { panelId: panelIds[0], body: 'Is this the right word for families?' });
    await comment(curator, revisionId, { parentId: root.body.id, body: 'Changed it to “push”.' });
    const inbox = await request(t.http).get('/api/notifications?unread=true').set(educator.auth);
    expect(inbox.body.items).toContainEqual(expect.objectContaining({
      kind: 'comment_reply', title: expect.stringContaining('Felix Braun replied'), body: expect.stringContaining('Changed it to “push”.'), link: `/reviews/${revisionId}`,
    }));
  });

  it('refuses a panel the revision does not have, a range without a panel, and a parent from elsewhere', async () => {
    const { storyId } = await storyWithPanels(t, curator.auth, exhibitId);
    const { revisionId } = await submit(t, curator.auth, storyId);
    const other = await submit(t, curator.auth, (await storyWithPanels(t, curator.auth, exhibitId)).storyId);
    const elsewhere = await comment(educator, other.revisionId, { body: 'On another story.' });
    const cases: [Record<string, unknown>, (string | number)[]][] = [
      [{ panelId: 999_999, body: 'x' }, ['panelId']],
      [{ range: { from: 0, to: 3, quote: 'Hot' }, body: 'x' }, ['range']],
      [{ parentId: elsewhere.body.id, body: 'x' }, ['parentId']],
      [{ body: '   ' }, ['body']],
    ];
    for (const [body, path] of cases) {
      const res = await comment(educator, revisionId, body);
      expect({ body, status: res.status, paths: res.body.errors?.map((e: { path: unknown }) => e.path) }).toEqual({ body, status: 400, paths: [path] });
    }
  });

  it('carries unresolved comments, with their replies, to the next revision while their panel exists', async () => {
    const { storyId, panelIds } = await storyWithPanels(t, curator.auth, exhibitId, [paragraphDoc('First panel.'), paragraphDoc('Second panel.')]);
    const [kept, dropped] = panelIds as [number, number];
    const first = await submit(t, curator.auth, storyId);
    const open = await comment(educator, first.revisionId, { panelId: kept, range: { from: 0, to: 5, quote: 'First' }, body: 'Open question.' });
    const reply = await comment(curator, first.revisionId, { parentId: open.body.id, body: 'Working on it.' });
    const done = await comment(educator, first.revisionId, { panelId: kept, body: 'Settled.' });
    await request(t.http).patch(`/api/comments/${done.body.id}`).set(educator.auth).send({ resolved: true });
    await comment(educator, first.revisionId, { panelId: dropped, body: 'On a panel about to go.' });
    const storyWide = await comment(educator, first.revisionId, { body: 'The story as a whole.' });
    // In review the panels are closed; withdrawn, the story is a draft again and the panel can go.
    expect((await request(t.http).post(`/api/stories/${storyId}/withdraw`).set(curator.auth)).status).toBe(200);
    expect((await request(t.http).delete(`/api/panels/${dropped}`).set(curator.auth)).status).toBe(204);

    const second = await submit(t, curator.auth, storyId);
    const carried = (await request(t.http).get(`/api/revisions/${second.revisionId}`).set(educator.auth)).body.comments;
    expect(carried).toEqual([
      expect.objectContaining({ panelId: kept, range: { from: 0, to: 5, quote: 'First' }, body: 'Open question.', author: { id: educator.person.id, name: 'Grace Mensah' }, parentId: null, carriedFromRevisionId: first.revisionId, createdAt: open.body.createdAt }),
      expect.objectContaining({ body: 'Working on it.', parentId: expect.any(Number), carriedFromRevisionId: first.revisionId, createdAt: reply.body.createdAt }),
      expect.objectContaining({ panelId: null, body: storyWide.body.body, carriedFromRevisionId: first.revisionId }),
    ]);
    expect(carried[1].parentId).toBe(carried[0].id);
    expect(carried.map((c: { revisionId: number }) => c.revisionId)).toEqual([second.revisionId, second.revisionId, second.revisionId]);
  });
});
