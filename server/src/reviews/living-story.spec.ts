import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { paragraphDoc } from '../../test/authoring-fixtures.js';
import { approvedGallery, buildRelease } from '../../test/release-fixtures.js';
import { createReviewApp, imageDoc, member, reviewVenue, storyWithPanels, submit, verdict, type Headers } from '../../test/review-fixtures.js';
import { bearer, createPerson, signIn, type TestApp } from '../../test/test-app.js';

// Issue 12, "the living story": an approved story is revised, a submission withdrawn, and what
// reviewers, releases and translators see meanwhile.
let t: TestApp;
let admin: Headers;
let curator: Headers;
let educator: Headers;
let translator: Headers;
let exhibitId: number;

beforeAll(async () => {
  t = await createReviewApp();
  const venue = await reviewVenue(t, 'living-story');
  admin = venue.admin;
  exhibitId = venue.exhibit.id;
  await request(t.http).patch(`/api/venues/${venue.venue.id}`).set(admin).send({ targetLocales: ['fr'] }).expect(200);
  curator = (await member(t, ['curator'])).auth;
  educator = (await member(t, ['educator'])).auth;
  const person = await createPerson(t, { roles: ['translator'], locales: ['fr'] });
  translator = bearer((await signIn(t, person.email)).accessToken);
});
afterAll(() => t.close());

const storyOf = async (storyId: number) => (await request(t.http).get(`/api/stories/${storyId}`).set(curator)).body;
const move = (storyId: number, action: 'revise' | 'withdraw', who = curator) => request(t.http).post(`/api/stories/${storyId}/${action}`).set(who);
const edit = (panelId: number, text: string, version: number) => request(t.http).put(`/api/panels/${panelId}`).set(curator).send({ doc: paragraphDoc(text), version }).expect(200);

async function approved(texts = ['Plates move a few centimetres a year.']) {
  const story = await storyWithPanels(t, curator, exhibitId, texts.map((text) => paragraphDoc(text)));
  const { revisionId } = await submit(t, curator, story.storyId);
  expect((await verdict(t, educator, revisionId, { verdict: 'approve' })).status).toBe(201);
  return { ...story, revisionId };
}

describe('POST /api/stories/:id/revise', () => {
  it('opens a draft of an approved story; the approved revision stays the story’s approved one until a newer one is approved', async () => {
    const story = await approved();
    expect(await storyOf(story.storyId)).toMatchObject({ state: 'approved', approvedRevision: { id: story.revisionId, number: 1 } });

    const revised = await move(story.storyId, 'revise');
    expect(revised.status).toBe(200);
    expect(revised.body).toMatchObject({ id: story.storyId, state: 'draft', approvedRevision: { id: story.revisionId, number: 1 } });
    await edit(story.panelIds[0]!, 'Plates move a few centimetres each year.', 1);

    const second = await submit(t, curator, story.storyId);
    expect(second).toMatchObject({ number: 2, state: 'in_review' });
    expect(await storyOf(story.storyId)).toMatchObject({ state: 'in_review', approvedRevision: { id: story.revisionId, number: 1 } });
    expect((await request(t.http).get(`/api/revisions/${second.revisionId}/compare`).set(educator)).body).toMatchObject({
      basis: 'approved', base: { id: story.revisionId }, diff: [{ panelId: story.panelIds[0], status: 'changed' }],
    });

    await verdict(t, educator, second.revisionId, { verdict: 'approve' });
    expect(await storyOf(story.storyId)).toMatchObject({ state: 'approved', approvedRevision: { id: second.revisionId, number: 2 } });
    const listed = (await request(t.http).get(`/api/stories/${story.storyId}/revisions`).set(curator)).body;
    expect(listed.map((revision: { number: number; state: string }) => [revision.number, revision.state])).toEqual([[2, 'approved'], [1, 'approved']]);

    const audit = (await request(t.http).get('/api/audit?action=story.revised&pageSize=100').set(admin)).body.items;
    expect(audit).toContainEqual(expect.objectContaining({ action: 'story.revised', target: { type: 'story', id: String(story.storyId) }, details: { approvedRevisionId: story.revisionId, approvedNumber: 1 } }));
  });

  it('refuses a story that is not approved (409 naming its state), and anyone but a curator (403)', async () => {
    const draft = await storyWithPanels(t, curator, exhibitId);
    const refused = await move(draft.storyId, 'revise');
    expect(refused.status).toBe(409);
    expect(refused.body.message).toBe('This story is Draft; only a story that is Approved can be revised.');

    const story = await approved();
    expect((await move(story.storyId, 'revise', educator)).status).toBe(403);
    expect((await move(story.storyId, 'revise', admin)).status).toBe(403);
    expect((await storyOf(story.storyId)).state).toBe('approved');
  });
});

describe('releases of a revised story', () => {
  const releasedStory = async (technician: Headers, releaseId: number) => {
    const { manifest } = (await request(t.http).get(`/api/releases/${releaseId}/manifest`).set(technician).expect(200)).body;
    return JSON.parse(manifest).stories[0] as { revisionId: number; panels: { docs: Record<string, unknown> }[] };
  };

  it('carry the approved revision and its translations while a newer draft is written and reviewed, and the newer revision once it is approved and translated', async () => {
    const g = await approvedGallery(t, 'living-story-release', { fallbackToSource: false });
    const frenchUnits = async () => (await request(t.http).get(`/api/stories/${g.story.storyId}/translations/fr/units?pageSize=100`).set(translator).expect(200)).body.items as { unitId: string; source: string; status: string; version: number }[];
    const translateAll = async () => {
      for (const unit of (await frenchUnits()).filter((each) => each.status !== 'translated')) {
        await request(t.http).put(`/api/stories/${g.story.storyId}/translations/fr/units/${encodeURIComponent(unit.unitId)}`).set(translator).send({ text: `FR ${unit.source}`, version: unit.version }).expect(200);
      }
    };
    await translateAll();

    await move(g.story.storyId, 'revise', g.curator.auth).expect(200);
    const fixed = { type: 'doc', content: [paragraphDoc('The map shows where the plates meet.').content[0], imageDoc(g.imageId).content![1]] };
    await request(t.http).put(`/api/panels/${g.story.panelIds[0]}`).set(g.curator.auth).send({ doc: fixed, version: 1 }).expect(200);
    const { revisionId: newer } = await submit(t, g.curator.auth, g.story.storyId);

    // The venue does not fall back to English, yet the release builds: the approved revision's French is complete.
    const during = await buildRelease(t, g.technician.auth, g.gallery.id);
    expect(during.state).toBe('ready');
    const carried = await releasedStory(g.technician.auth, during.id);
    expect(carried.revisionId).toBe(g.revisionId);
    expect(JSON.stringify(carried.panels[0]!.docs.en)).toContain('The map shows where plates meet.');
    expect(JSON.stringify(carried.panels[0]!.docs.fr)).toContain('FR The map shows where plates meet.');

    await verdict(t, g.educator.auth, newer, { verdict: 'approve' }).expect(201);
    const refused = await request(t.http).post(`/api/galleries/${g.gallery.id}/releases`).set(g.technician.auth).send({});
    expect(refused.status).toBe(422);
    expect(refused.body.errors).toContainEqual({ path: ['locales', 'fr', g.story.storyId], message: expect.stringMatching(/in fr: 1 stale of \d+ texts/) });

    await translateAll();
    const after = await buildRelease(t, g.technician.auth, g.gallery.id);
    const released = await releasedStory(g.technician.auth, after.id);
    expect(released.revisionId).toBe(newer);
    expect(JSON.stringify(released.panels[0]!.docs.fr)).toContain('FR The map shows where the plates meet.');
  });
});

describe('POST /api/stories/:id/withdraw', () => {
  it('takes a submission without a verdict back to Draft, out of the review queue, and keeps it in the history as withdrawn', async () => {
    const { storyId } = await storyWithPanels(t, curator, exhibitId);
    const first = await submit(t, curator, storyId);
    const res = await move(storyId, 'withdraw');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: storyId, state: 'draft', approvedRevision: null });

    const queue = (await request(t.http).get('/api/reviews/queue?pageSize=100').set(educator)).body.items;
    expect(queue.map((item: { revisionId: number }) => item.revisionId)).not.toContain(first.revisionId);
    const late = await verdict(t, educator, first.revisionId, { verdict: 'approve' });
    expect(late.status).toBe(409);
    expect(late.body.message).toMatch(/withdrawn by its curator/);

    const second = await submit(t, curator, storyId);
    const listed = (await request(t.http).get(`/api/stories/${storyId}/revisions`).set(curator)).body;
    expect(listed.map((revision: { id: number; state: string }) => [revision.id, revision.state])).toEqual([[second.revisionId, 'open'], [first.revisionId, 'withdrawn']]);
    expect((await request(t.http).get(`/api/revisions/${second.revisionId}/compare`).set(educator)).body).toMatchObject({ basis: 'first_review', base: null });
    const audit = (await request(t.http).get('/api/audit?action=revision.withdrawn&pageSize=100').set(admin)).body.items;
    expect(audit).toContainEqual(expect.objectContaining({ target: { type: 'revision', id: String(first.revisionId) }, details: { storyId, number: 1 } }));
  });

  it('after a revise, keeps the approved revision, and the next submission is compared with it', async () => {
    const story = await approved();
    await move(story.storyId, 'revise').expect(200);
    await submit(t, curator, story.storyId);
    await move(story.storyId, 'withdraw').expect(200);
    expect(await storyOf(story.storyId)).toMatchObject({ state: 'draft', approvedRevision: { id: story.revisionId, number: 1 } });
    const third = await submit(t, curator, story.storyId);
    expect(third.number).toBe(3);
    expect((await request(t.http).get(`/api/revisions/${third.revisionId}/compare`).set(educator)).body).toMatchObject({ basis: 'approved', base: { id: story.revisionId } });
  });

  it('refuses once an educator has approved the submission, while the venue waits for a second approval (409)', async () => {
    const venue = await reviewVenue(t, 'living-story-two');
    await request(t.http).patch(`/api/venues/${venue.venue.id}`).set(venue.admin).send({ requiredApprovals: 2 }).expect(200);
    const { storyId } = await storyWithPanels(t, curator, venue.exhibit.id);
    const { revisionId } = await submit(t, curator, storyId);
    await verdict(t, educator, revisionId, { verdict: 'approve' });
    const res = await move(storyId, 'withdraw');
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/already given a verdict/);
    expect((await storyOf(storyId)).state).toBe('in_review');
  });

  it('refuses a story with no open submission (409), and anyone but a curator (403)', async () => {
    const { storyId } = await storyWithPanels(t, curator, exhibitId);
    expect((await move(storyId, 'withdraw')).status).toBe(409);
    await submit(t, curator, storyId);
    expect((await move(storyId, 'withdraw', educator)).status).toBe(403);
    expect((await storyOf(storyId)).state).toBe('in_review');
  });
});

describe('comments carried to the next revision', () => {
  it('follow their words when they moved, and say when the words they were anchored to changed', async () => {
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId, [paragraphDoc('Hot rock rises and cool rock sinks.')]);
    const first = await submit(t, curator, storyId);
    const comment = (range: { from: number; to: number; quote: string }, body: string) =>
      request(t.http).post(`/api/revisions/${first.revisionId}/comments`).set(educator).send({ panelId: panelIds[0], range, body }).expect(201);
    await comment({ from: 9, to: 14, quote: 'rises' }, 'How fast?');
    await comment({ from: 19, to: 28, quote: 'cool rock' }, 'How cool?');
    await verdict(t, educator, first.revisionId, { verdict: 'request_changes', note: 'See the comments.' });

    await edit(panelIds[0]!, 'Very hot rock rises and colder rock sinks.', 1);
    const second = await submit(t, curator, storyId);
    const carried = (await request(t.http).get(`/api/revisions/${second.revisionId}`).set(educator)).body.comments;
    expect(carried).toEqual([
      expect.objectContaining({ body: 'How fast?', range: { from: 14, to: 19, quote: 'rises' }, anchorChanged: false, carriedFromRevisionId: first.revisionId }),
      expect.objectContaining({ body: 'How cool?', range: { from: 19, to: 28, quote: 'cool rock' }, anchorChanged: true, carriedFromRevisionId: first.revisionId }),
    ]);
  });
});

describe('translations of a revised story', () => {
  type Unit = { unitId: string; panelId: number | null; source: string; status: string; version: number };
  const units = async (storyId: number): Promise<Unit[]> =>
    (await request(t.http).get(`/api/stories/${storyId}/translations/fr/units?pageSize=100`).set(translator).expect(200)).body.items;

  it('become stale where the source text changed once the newer revision is approved, and stay translated elsewhere', async () => {
    const story = await approved(['Plates move a few centimetres a year.', 'The sea floor sinks as it cools.']);
    for (const unit of await units(story.storyId)) {
      await request(t.http).put(`/api/stories/${story.storyId}/translations/fr/units/${encodeURIComponent(unit.unitId)}`).set(translator).send({ text: `FR ${unit.source}`, version: unit.version }).expect(200);
    }
    expect((await units(story.storyId)).map((unit) => unit.status)).toEqual(['translated', 'translated', 'translated']);

    await move(story.storyId, 'revise').expect(200);
    await edit(story.panelIds[0]!, 'Plates move a few centimetres each year.', 1);
    const { revisionId } = await submit(t, curator, story.storyId);
    await verdict(t, educator, revisionId, { verdict: 'approve' }).expect(201);

    const after = await units(story.storyId);
    // The first unit is the story's title (on no panel), unchanged by the revision.
    expect(after.map((unit) => [unit.panelId, unit.status])).toEqual([[null, 'translated'], [story.panelIds[0], 'stale'], [story.panelIds[1], 'translated']]);
    const completeness = (await request(t.http).get(`/api/stories/${story.storyId}/translations`).set(translator).expect(200)).body;
    expect(completeness).toContainEqual(expect.objectContaining({ locale: 'fr', stale: 1 }));
  });
});
