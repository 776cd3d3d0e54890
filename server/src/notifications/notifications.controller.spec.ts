import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { capturedMailTo, discardUnsentMail, mailDir } from '../../test/mail-helpers.js';
import { createReviewApp, deliverAllMail, member, reviewVenue, storyWithPanels, submit, verdict, type Member } from '../../test/review-fixtures.js';
import type { TestApp } from '../../test/test-app.js';

let t: TestApp;
let curator: Member;
let exhibitId: number;
const publicUrl = process.env.PUBLIC_URL ?? 'http://127.0.0.1:4310';

beforeAll(async () => {
  mailDir();
  t = await createReviewApp();
  await discardUnsentMail(t.app);
  exhibitId = (await reviewVenue(t, 'notifications')).exhibit.id;
  curator = await member(t, ['curator'], { name: 'Oskar Lind' });
});
afterAll(() => t.close());

describe('review notifications', () => {
  it('mails the educators when a revision is submitted, each in their language, with a link to the review page', async () => {
    const english = await member(t, ['educator'], { name: 'Ruth Adeyemi' });
    const french = await member(t, ['educator'], { name: 'Élodie Garnier', uiLanguage: 'fr' });
    const { storyId } = await storyWithPanels(t, curator.auth, exhibitId);
    const title = (await request(t.http).get(`/api/stories/${storyId}`).set(curator.auth)).body.title;
    const { revisionId } = await submit(t, curator.auth, storyId);
    await deliverAllMail(t);

    const [mail, ...more] = await capturedMailTo(english.person.email);
    expect(more).toEqual([]);
    expect(mail!.subject).toBe(`“${title}” is ready for review`);
    expect(mail!.text).toContain('Hello Ruth Adeyemi,');
    expect(mail!.text).toContain(`Oskar Lind submitted revision 1 of “${title}” for review.`);
    expect(mail!.text).toContain(`${publicUrl}/reviews/${revisionId}\n`);
    expect(mail!.html).toContain(`<a href="${publicUrl}/reviews/${revisionId}">`);

    const [courrier] = await capturedMailTo(french.person.email);
    expect(courrier!.subject).toBe(`« ${title} » est prêt à être relu`);
    expect(courrier!.text).toContain('Bonjour Élodie Garnier,');
    expect(courrier!.text).toContain(`${publicUrl}/reviews/${revisionId}\n`);
    expect(await capturedMailTo(curator.person.email)).toEqual([]);
  });

  it('mails the author each verdict, the note included', async () => {
    const educator = await member(t, ['educator'], { name: 'Samir Nasser' });
    const author = await member(t, ['curator']);
    const { storyId } = await storyWithPanels(t, author.auth, exhibitId);
    const first = await submit(t, author.auth, storyId);
    await verdict(t, educator.auth, first.revisionId, { verdict: 'request_changes', note: 'Explain what a plate is first.' });
    const second = await submit(t, author.auth, storyId);
    await verdict(t, educator.auth, second.revisionId, { verdict: 'approve' });
    await deliverAllMail(t);

    const mails = await capturedMailTo(author.person.email);
    expect(mails.map((mail) => mail.subject).sort()).toEqual([expect.stringMatching(/: changes requested$/), expect.stringMatching(/: revision 2 approved$/)].sort());
    const changes = mails.find((mail) => mail.subject!.endsWith('changes requested'))!;
    expect(changes.text).toContain('Samir Nasser asked for changes to revision 1');
    expect(changes.text).toContain('Explain what a plate is first.');
    expect(changes.text).toContain(`${publicUrl}/reviews/${first.revisionId}\n`);
    expect(mails.find((mail) => mail.subject!.endsWith('approved'))!.text).toContain(`${publicUrl}/reviews/${second.revisionId}\n`);
  });

  it('sends no mail of a kind the person turned off, yet still lists it in the studio', async () => {
    const educator = await member(t, ['educator']);
    const preferences = await request(t.http).put('/api/notifications/preferences').set(educator.auth).send({ revision_submitted: { email: false } });
    expect(preferences.status).toBe(200);
    expect(preferences.body).toEqual({ revision_submitted: { email: false }, verdict: { email: true }, comment_reply: { email: true } });
    expect((await request(t.http).get('/api/notifications/preferences').set(educator.auth)).body).toEqual(preferences.body);

    const { storyId } = await storyWithPanels(t, curator.auth, exhibitId);
    const { revisionId } = await submit(t, curator.auth, storyId);
    await deliverAllMail(t);
    expect(await capturedMailTo(educator.person.email)).toEqual([]);
    const inbox = await request(t.http).get('/api/notifications').set(educator.auth);
    expect(inbox.body).toMatchObject({ total: 1, unread: 1, items: [{ kind: 'revision_submitted', link: `/reviews/${revisionId}`, readAt: null }] });
  });

  it('refuses a preference that is not a yes or no', async () => {
    const res = await request(t.http).put('/api/notifications/preferences').set(curator.auth).send({ verdict: { email: 'sometimes' } });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ path: ['verdict', 'email'], message: expect.any(String) }]);
  });
});

describe('the notification list', () => {
  it('counts unread ones, filters to them, and marks some or all read, only one’s own', async () => {
    const educator = await member(t, ['educator']);
    const bystander = await member(t, ['educator']);
    const revisionIds: number[] = [];
    for (let i = 0; i < 3; i += 1) revisionIds.push((await submit(t, curator.auth, (await storyWithPanels(t, curator.auth, exhibitId)).storyId)).revisionId);
    const all = (await request(t.http).get('/api/notifications?pageSize=2').set(educator.auth)).body;
    expect(all).toMatchObject({ total: 3, unread: 3, page: 1, pageSize: 2 });
    expect(all.items.map((item: { link: string }) => item.link)).toEqual([`/reviews/${revisionIds[2]}`, `/reviews/${revisionIds[1]}`]);

    const theirs = (await request(t.http).get('/api/notifications').set(bystander.auth)).body.items[0].id;
    expect((await request(t.http).post('/api/notifications/read').set(educator.auth).send({ ids: [all.items[0].id, theirs] })).status).toBe(204);
    const unread = (await request(t.http).get('/api/notifications?unread=true').set(educator.auth)).body;
    expect(unread).toMatchObject({ total: 2, unread: 2 });
    expect((await request(t.http).get('/api/notifications').set(bystander.auth)).body.unread).toBe(3);

    await request(t.http).post('/api/notifications/read').set(educator.auth).send({ all: true });
    expect((await request(t.http).get('/api/notifications').set(educator.auth)).body).toMatchObject({ total: 3, unread: 0 });
  });
});
