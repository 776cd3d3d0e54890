import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import type { MyWorkView } from '@mantlepiece/shared';
import { paragraphDoc } from '../../test/authoring-fixtures.js';
import { approve, approvedGallery, buildRelease, pairedKiosk } from '../../test/release-fixtures.js';
import { createReviewApp, libraryImage, member, reviewVenue, storyWithPanels, submit, verdict, type Headers } from '../../test/review-fixtures.js';
import { bearer, createPerson, signIn, uniqueEmail } from '../../test/test-app.js';

const t = await createReviewApp();
afterAll(() => t.close());

// Names that sort first, so this suite's rows lead lists that other suites have filled too.
const { admin, venue, exhibit } = await reviewVenue(t, '000-my-work');
const curator = await member(t, ['curator']);
const educator = await member(t, ['educator']);
const technician = await member(t, ['technician']);

const workOf = async (auth: Headers): Promise<MyWorkView> => {
  const res = await request(t.http).get('/api/me/work').set(auth);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as MyWorkView;
};
const titleOf = async (storyId: number) => (await request(t.http).get(`/api/stories/${storyId}`).set(curator.auth)).body.title as string;

describe('GET /api/me/work', () => {
  it('gives a curator their drafts, stories sent back with changes requested, and open comments, each linked to the story', async () => {
    const draft = await storyWithPanels(t, curator.auth, exhibit.id);
    const sentBack = await storyWithPanels(t, curator.auth, exhibit.id);
    const { revisionId } = await submit(t, curator.auth, sentBack.storyId);
    for (const body of ['Say “grip” for friction.', 'Name the source of this figure.']) {
      expect((await request(t.http).post(`/api/revisions/${revisionId}/comments`).set(educator.auth).send({ body })).status).toBe(201);
    }
    expect((await verdict(t, educator.auth, revisionId, { verdict: 'request_changes', note: 'Two comments to answer.' })).status).toBe(201);
    const someoneElses = await storyWithPanels(t, (await member(t, ['curator'])).auth, exhibit.id);

    const { curator: work, educator: none } = await workOf(curator.auth);
    expect(none).toBeUndefined();
    expect(work!.drafts.items[0]).toEqual({ storyId: draft.storyId, title: await titleOf(draft.storyId), updatedAt: expect.any(String), link: `/stories/${draft.storyId}` });
    expect(work!.drafts.items.map((item) => item.storyId)).not.toContain(someoneElses.storyId);
    expect(work!.changesRequested.items.map((item) => item.storyId)).toEqual([sentBack.storyId]);
    expect(work!.openComments).toEqual({
      items: [{ storyId: sentBack.storyId, title: await titleOf(sentBack.storyId), revisionId, openComments: 2, latestAt: expect.any(String), link: `/stories/${sentBack.storyId}` }],
      total: 1,
    });
  });

  it('gives an educator the review queue, longest waiting first, with how long each has waited', async () => {
    const story = await storyWithPanels(t, curator.auth, exhibit.id);
    // Submitted "ten years ago" by the suite's clock, so it waits longer than any other suite's.
    const tenYearsMs = 10 * 365 * 86_400_000;
    t.clock.advance(-tenYearsMs);
    const { revisionId } = await submit(t, curator.auth, story.storyId);
    t.clock.advance(tenYearsMs);
    const { educator: work } = await workOf(educator.auth);
    expect(work!.reviewQueue.items[0]).toMatchObject({
      revisionId, storyId: story.storyId, revisionNumber: 1, waitingS: tenYearsMs / 1000, link: `/reviews/${revisionId}`,
    });
    expect(work!.reviewQueue.total).toBeGreaterThanOrEqual(1);
  });

  it('gives a translator each story and locale of theirs with units untranslated or stale', async () => {
    // Kalaallisut (kl) is this suite's alone, so other suites' stories cannot crowd its worklist.
    expect((await request(t.http).patch(`/api/venues/${venue.id}`).set(admin).send({ targetLocales: ['fr', 'kl'] })).status).toBe(200);
    const translatorPerson = await createPerson(t, { roles: ['translator'], locales: ['kl'] });
    const translator = bearer((await signIn(t, translatorPerson.email)).accessToken);
    const story = await storyWithPanels(t, curator.auth, exhibit.id, [paragraphDoc('The sea floor sinks as it cools.')]);
    await approve(t, curator.auth, educator.auth, story.storyId);
    const { translator: work, curator: none } = await workOf(translator);
    expect(none).toBeUndefined();
    const item = work!.translations.items.find((entry) => entry.storyId === story.storyId);
    // The story's title and its one paragraph are two units, neither yet translated into Kalaallisut.
    expect(item).toEqual({ storyId: story.storyId, title: await titleOf(story.storyId), locale: 'kl', untranslated: 2, stale: 0, link: `/translations/${story.storyId}/kl` });
    expect(work!.translations.items.every((entry) => entry.locale === 'kl' && entry.untranslated + entry.stale > 0)).toBe(true);
  });

  it('gives a technician silent kiosks and releases ready to publish, each linked to its page', async () => {
    // A gallery of approved stories whose venue falls back to the source language, so it can be released at once.
    const released = await approvedGallery(t, '000-my-work-releases');
    const { credential } = await pairedKiosk(t, released.admin, technician.auth, released.gallery.id);
    const release = await buildRelease(t, technician.auth, released.gallery.id);
    expect(release.state).toBe('ready');
    const { technician: work } = await workOf(technician.auth);
    // Never reported since pairing: offline.
    expect(work!.kiosks.items.find((item) => item.kioskId === credential.kioskId)).toMatchObject({
      state: 'offline', lastHeartbeatAt: null, gallery: released.gallery.name, demo: false, link: `/fleet/${credential.kioskId}`,
    });
    expect(work!.releases.items[0]).toEqual({
      releaseId: release.id, number: release.number, gallery: released.gallery.name, state: 'ready', at: expect.any(String), failure: null,
      link: `/releases?gallery=${released.gallery.id}&build=${release.id}`,
    });
  });

  it('gives an admin pending invitations and licences that end within 60 days', async () => {
    const email = uniqueEmail('my-work-invitee');
    expect((await request(t.http).post('/api/users/invitations').set(admin).send({ email, name: 'Aiyana Redcloud', roles: ['translator'], locales: ['es'] })).status).toBe(201);
    const mediaId = await libraryImage(t, curator.auth, venue.id, { credit: 'Map: Basalt Point', licence: { kind: 'spdx', id: 'CC-BY-4.0' }, licenceExpiresOn: '1999-12-31' });
    const { admin: work, technician: none } = await workOf(admin);
    expect(none).toBeUndefined();
    expect(work!.invitations.items[0]).toMatchObject({ email, name: 'Aiyana Redcloud', roles: ['translator'], link: '/people' });
    expect(work!.licences.items[0]).toMatchObject({ mediaId, expiresOn: '1999-12-31', link: `/media/${mediaId}` });
    expect(work!.licences.items[0]!.daysLeft).toBeLessThan(0);
    expect(work!.licences.items.every((item) => item.daysLeft <= 60)).toBe(true);
  });

  it('answers 401 without a token', async () => {
    const res = await request(t.http).get('/api/me/work');
    expect(res.status).toBe(401);
  });
});
