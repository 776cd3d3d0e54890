import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MediaAsset } from '../src/media/models/media-asset.model.js';
import { Notification } from '../src/notifications/models/notification.model.js';
import { Revision } from '../src/revisions/models/revision.model.js';
import { Story } from '../src/stories/models/story.model.js';
import { UsersService } from '../src/users/users.service.js';
import { paragraphDoc, signedInAs } from './authoring-fixtures.js';
import { createReviewApp, imageDoc, libraryImage, reviewVenue, storyWithPanels, submit, type Headers } from './review-fixtures.js';
import { createPerson, type TestApp } from './test-app.js';
import { memberAt, type VenueMember } from './venue-fixtures.js';

/**
 * Venues are boundaries for authoring (issue 13): a person who belongs to one venue reaches that
 * venue's stories, panels, revisions, comments, images and translations, and another venue's
 * answer exactly as ids that do not exist. The rules are the issue's own words; no outside source.
 */

let t: TestApp;
let orgAdmin: Headers;
let one: Awaited<ReturnType<typeof venueWorld>>;
let two: Awaited<ReturnType<typeof venueWorld>>;

const IMAGE_DETAILS = { credit: 'Map: Suite Survey', licence: { kind: 'spdx', id: 'CC-BY-4.0' }, alt: { en: 'Plates meeting at a trench', fr: 'Deux plaques à une fosse' } };
/** An id no row has: what a missing object answers is the yardstick for another venue's. */
const MISSING = 2_000_000_000;

/** A venue with one member of each authoring role, an image, a draft showing it and a story in review with a comment. */
async function venueWorld(label: string) {
  const { venue, exhibit } = await reviewVenue(t, label);
  const curator = await memberAt(t, venue.id, ['curator']);
  const educator = await memberAt(t, venue.id, ['educator']);
  const translator = await memberAt(t, venue.id, ['translator'], ['fr']);
  const venueAdmin = await memberAt(t, venue.id, ['admin']);
  const imageId = await libraryImage(t, curator.headers, venue.id, IMAGE_DETAILS);
  const draft = await storyWithPanels(t, curator.headers, exhibit.id, [imageDoc(imageId)]);
  const reviewed = await storyWithPanels(t, curator.headers, exhibit.id, [paragraphDoc('Cold plates sink into the mantle.')]);
  const { revisionId } = await submit(t, curator.headers, reviewed.storyId);
  const comment = await request(t.http).post(`/api/revisions/${revisionId}/comments`).set(educator.headers).send({ body: 'Could this be shorter?' }).expect(201);
  return { venue, exhibit, curator, educator, translator, venueAdmin, imageId, draft, reviewed, revisionId, commentId: comment.body.id as number };
}

beforeAll(async () => {
  t = await createReviewApp();
  orgAdmin = await signedInAs(t, 'admin');
  one = await venueWorld('bounds-one');
  two = await venueWorld('bounds-two');
}, 180_000);
afterAll(() => t.close());

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';
const call = (method: Method, path: string, who: Headers, body?: unknown) => {
  const req = request(t.http)[method](path).set(who);
  return typeof body === 'string' ? req.set('Content-Type', 'application/xliff+xml').send(body) : body === undefined ? req : req.send(body as object);
};

/** Asks for `path` with another venue's id and with a missing one: both answer 404, with the same body. */
async function expectHidden(method: Method, path: (id: number) => string, otherId: number, who: Headers, body?: unknown) {
  const other = await call(method, path(otherId), who, body);
  const missing = await call(method, path(MISSING), who, body);
  expect({ route: `${method.toUpperCase()} ${path(otherId)}`, status: other.status, body: other.body }).toEqual({ route: `${method.toUpperCase()} ${path(otherId)}`, status: 404, body: missing.body });
  expect(missing.status).toBe(404);
}

const XLIFF = '<?xml version="1.0"?><xliff xmlns="urn:oasis:names:tc:xliff:document:2.0" version="2.1" srcLang="en" trgLang="fr"><file id="f"></file></xliff>';

describe('a member of one venue at their own venue', () => {
  it('reads and writes its stories, panels, revisions, comments, images and translations', async () => {
    const { curator, educator, translator, venueAdmin } = one;
    for (const who of [curator, educator, translator, venueAdmin]) {
      expect((await call('get', `/api/stories/${one.draft.storyId}`, who.headers)).status).toBe(200);
      expect((await call('get', `/api/media/${one.imageId}`, who.headers)).status).toBe(200);
      expect((await call('get', `/api/stories/${one.reviewed.storyId}/revisions`, who.headers)).status).toBe(200);
      expect((await call('get', `/api/revisions/${one.revisionId}`, who.headers)).status).toBe(200);
    }
    const story = await call('patch', `/api/stories/${one.draft.storyId}`, curator.headers, { title: 'Renamed at home' });
    expect(story.status).toBe(200);
    expect(story.body.can).toMatchObject({ edit: true, delete: true });
    expect((await call('get', `/api/stories/${one.draft.storyId}/preflight`, curator.headers)).status).toBe(200);
    expect((await call('patch', `/api/panels/${one.draft.panelIds[0]}`, curator.headers, { wordBudget: 70 })).status).toBe(200);
    expect((await call('patch', `/api/media/${one.imageId}`, curator.headers, { credit: 'Map: Suite Survey, 2026' })).status).toBe(200);
    expect((await call('get', `/api/revisions/${one.revisionId}/compare`, educator.headers)).status).toBe(200);
    expect((await call('post', `/api/revisions/${one.revisionId}/comments`, curator.headers, { body: 'Trimmed it.', parentId: one.commentId })).status).toBe(201);
    const units = await call('get', `/api/stories/${one.draft.storyId}/translations/fr/units`, translator.headers);
    expect(units.status).toBe(200);
    const title = units.body.items.find((unit: { unitId: string }) => unit.unitId.endsWith('.title'));
    expect((await call('put', `/api/stories/${one.draft.storyId}/translations/fr/units/${title.unitId}`, translator.headers, { text: 'Renommé', version: 0 })).status).toBe(200);
    expect((await call('get', `/api/stories/${one.draft.storyId}/translations/fr/xliff`, translator.headers)).status).toBe(200);
    expect((await call('get', `/api/stories/${one.draft.storyId}/translations/fr/preview`, venueAdmin.headers)).status).toBe(200);
  });

  it('uploads and starts stories at their only venue without naming it, and cannot name another', async () => {
    const story = await call('post', '/api/stories', one.curator.headers, { title: 'Started at home' });
    expect(story.status).toBe(201);
    expect((await t.app.get<typeof Story>(getModelToken(Story)).findByPk(story.body.id))!.venueId).toBe(one.venue.id);
    const elsewhere = await call('post', '/api/stories', one.curator.headers, { title: 'Not mine to start', venueId: two.venue.id });
    expect(elsewhere.status).toBe(422);
    expect(elsewhere.body.errors).toEqual([{ path: ['venueId'], message: 'There is no such venue.' }]);
    const otherExhibit = await call('post', '/api/stories', one.curator.headers, { title: 'Not mine either', exhibitId: two.exhibit.id });
    expect(otherExhibit.status).toBe(422);
    expect(otherExhibit.body.errors).toEqual([{ path: ['exhibitId'], message: 'There is no such exhibit.' }]);
  });
});

describe('another venue’s objects', () => {
  it('answer every reader of one venue as missing ids do', async () => {
    for (const who of [one.curator, one.educator, one.translator, one.venueAdmin]) {
      await expectHidden('get', (id) => `/api/stories/${id}`, two.draft.storyId, who.headers);
      await expectHidden('get', (id) => `/api/stories/${id}/revisions`, two.reviewed.storyId, who.headers);
      await expectHidden('get', (id) => `/api/stories/${id}/preflight`, two.draft.storyId, who.headers);
      await expectHidden('get', (id) => `/api/revisions/${id}`, two.revisionId, who.headers);
      await expectHidden('get', (id) => `/api/revisions/${id}/compare`, two.revisionId, who.headers);
      await expectHidden('get', (id) => `/api/media/${id}`, two.imageId, who.headers);
    }
    for (const who of [one.curator, one.translator, one.venueAdmin]) {
      await expectHidden('get', (id) => `/api/stories/${id}/translations`, two.draft.storyId, who.headers);
      await expectHidden('get', (id) => `/api/stories/${id}/translations/fr/units`, two.draft.storyId, who.headers);
      await expectHidden('get', (id) => `/api/stories/${id}/translations/fr/preview`, two.draft.storyId, who.headers);
      await expectHidden('get', (id) => `/api/stories/${id}/translations/fr/xliff`, two.draft.storyId, who.headers);
    }
  });

  it('refuse every write as missing ids do, and stay as they were', async () => {
    const curator = one.curator.headers;
    const [panelId] = two.draft.panelIds;
    await expectHidden('patch', (id) => `/api/stories/${id}`, two.draft.storyId, curator, { title: 'Taken over' });
    await expectHidden('delete', (id) => `/api/stories/${id}`, two.draft.storyId, curator);
    await expectHidden('post', (id) => `/api/stories/${id}/panels`, two.draft.storyId, curator, {});
    await expectHidden('post', (id) => `/api/stories/${id}/panels/reorder`, two.draft.storyId, curator, { panelIds: two.draft.panelIds });
    await expectHidden('put', (id) => `/api/panels/${id}`, panelId!, curator, { doc: paragraphDoc('Overwritten'), version: 1 });
    await expectHidden('patch', (id) => `/api/panels/${id}`, panelId!, curator, { wordBudget: 10 });
    await expectHidden('delete', (id) => `/api/panels/${id}`, panelId!, curator);
    for (const move of ['submit', 'withdraw', 'revise', 'retire']) {
      await expectHidden('post', (id) => `/api/stories/${id}/${move}`, move === 'submit' ? two.draft.storyId : two.reviewed.storyId, curator, {});
    }
    await expectHidden('post', (id) => `/api/revisions/${id}/comments`, two.revisionId, curator, { body: 'From outside' });
    await expectHidden('patch', (id) => `/api/comments/${id}`, two.commentId, curator, { resolved: true });
    await expectHidden('patch', (id) => `/api/media/${id}`, two.imageId, curator, { credit: 'Taken over' });
    await expectHidden('delete', (id) => `/api/media/${id}`, two.imageId, curator);
    await expectHidden('post', (id) => `/api/media/${id}/renditions/retry`, two.imageId, curator);
    await expectHidden('post', (id) => `/api/revisions/${id}/reviews`, two.revisionId, one.educator.headers, { verdict: 'approve' });
    await expectHidden('put', (id) => `/api/stories/${id}/translations/fr/units/s${id}.title`, two.draft.storyId, one.translator.headers, { text: 'Pris', version: 0 });
    await expectHidden('put', (id) => `/api/stories/${id}/translations/fr/xliff`, two.draft.storyId, one.translator.headers, XLIFF);

    const story = await call('get', `/api/stories/${two.reviewed.storyId}`, two.curator.headers);
    expect(story.body).toMatchObject({ state: 'in_review', panelCount: 1 });
    expect((await call('get', `/api/stories/${two.draft.storyId}`, two.curator.headers)).body.panels).toHaveLength(1);
    const revision = await call('get', `/api/revisions/${two.revisionId}`, two.educator.headers);
    expect(revision.body.reviews).toEqual([]);
    expect(revision.body.comments).toHaveLength(1);
    expect(revision.body.comments[0].resolvedAt).toBeNull();
  });

  it('cannot be shown in a panel: another venue’s image answers 422 as an unknown one', async () => {
    const [panelId] = one.draft.panelIds;
    const { version } = (await call('get', `/api/stories/${one.draft.storyId}`, one.curator.headers)).body.panels[0];
    const other = await call('put', `/api/panels/${panelId}`, one.curator.headers, { doc: imageDoc(two.imageId), version });
    const missing = await call('put', `/api/panels/${panelId}`, one.curator.headers, { doc: imageDoc(MISSING), version });
    expect(other.status).toBe(422);
    expect(other.body.errors).toEqual([{ path: expect.arrayContaining(['attrs', 'mediaId']), message: `There is no image ${two.imageId} in the media library.` }]);
    expect(other.body.errors[0].path).toEqual(missing.body.errors[0].path);
  });
});

describe('lists and their totals', () => {
  const storiesAt = (venueId: number) => t.app.get<typeof Story>(getModelToken(Story)).findAll({ where: { venueId }, attributes: ['id', 'state'] });

  it('show a member only their venue’s stories and images, counted alike', async () => {
    const stories = (await storiesAt(one.venue.id)).map((story) => story.id).sort((a, b) => a - b);
    const images = await t.app.get<typeof MediaAsset>(getModelToken(MediaAsset)).count({ where: { venueId: one.venue.id } });
    for (const who of [one.curator, one.educator, one.translator, one.venueAdmin]) {
      const page = (await call('get', '/api/stories?pageSize=100', who.headers)).body;
      expect({ total: page.total, ids: page.items.map((story: { id: number }) => story.id).sort((a: number, b: number) => a - b) }).toEqual({ total: stories.length, ids: stories });
      const library = (await call('get', '/api/media?pageSize=100', who.headers)).body;
      expect({ total: library.total, ids: library.items.map((asset: { id: number }) => asset.id) }).toEqual({ total: images, ids: [one.imageId] });
    }
  });

  it('keep the review queue, the worklist and my work to the member’s venue', async () => {
    const ofOne = await storiesAt(one.venue.id);
    const open = await t.app.get<typeof Revision>(getModelToken(Revision)).count({ where: { storyId: ofOne.map((story) => story.id), state: 'open' } });
    const queue = (await call('get', '/api/reviews/queue?pageSize=100', one.educator.headers)).body;
    expect(queue.total).toBe(open);
    expect(queue.items.map((item: { revisionId: number }) => item.revisionId)).toContain(one.revisionId);
    expect(queue.items.map((item: { revisionId: number }) => item.revisionId)).not.toContain(two.revisionId);

    const worklist = (await call('get', '/api/translations/stories?pageSize=100', one.translator.headers)).body;
    const translatable = ofOne.filter((story) => story.state !== 'retired').map((story) => story.id).sort((a, b) => a - b);
    expect({ total: worklist.total, ids: worklist.items.map((item: { storyId: number }) => item.storyId).sort((a: number, b: number) => a - b) }).toEqual({ total: translatable.length, ids: translatable });

    const educatorWork = (await call('get', '/api/me/work', one.educator.headers)).body;
    expect(educatorWork.educator.reviewQueue.total).toBe(open);
    const translatorWork = (await call('get', '/api/me/work', one.translator.headers)).body;
    expect(translatorWork.translator.translations.items.every((item: { storyId: number }) => translatable.includes(item.storyId))).toBe(true);
  });

  it('show the organisation admin every venue, and one venue when asked', async () => {
    const all = (await call('get', `/api/stories?pageSize=100&exhibitId=${two.exhibit.id}`, orgAdmin)).body;
    expect(all.items.map((story: { id: number }) => story.id)).toContain(two.draft.storyId);
    const onlyOne = (await call('get', `/api/stories?pageSize=100&venueId=${one.venue.id}`, orgAdmin)).body;
    expect(onlyOne.total).toBe((await storiesAt(one.venue.id)).length);
    expect(onlyOne.items.map((story: { id: number }) => story.id)).not.toContain(two.draft.storyId);
    const library = (await call('get', `/api/media?pageSize=100&venueId=${two.venue.id}`, orgAdmin)).body;
    expect(library.items.map((asset: { id: number }) => asset.id)).toEqual([two.imageId]);
  });
});

describe('resolving a comment', () => {
  it('is for its author or a reviewer of the revision; anyone else is refused 403, and `can` says so', async () => {
    const colleague = await memberAt(t, one.venue.id, ['curator']);
    const view = (await call('get', `/api/revisions/${one.revisionId}`, colleague.headers)).body;
    expect(view.comments.find((comment: { id: number }) => comment.id === one.commentId).can).toEqual({ reply: true, resolve: false });
    const refused = await call('patch', `/api/comments/${one.commentId}`, colleague.headers, { resolved: true });
    expect(refused.status).toBe(403);

    const ownComment = (await call('post', `/api/revisions/${one.revisionId}/comments`, colleague.headers, { body: 'Check the date.' })).body;
    expect(ownComment.can).toEqual({ reply: true, resolve: true });
    expect((await call('patch', `/api/comments/${ownComment.id}`, colleague.headers, { resolved: true })).status).toBe(200);

    const reviewer = await memberAt(t, one.venue.id, ['educator']);
    const byReviewer = await call('patch', `/api/comments/${one.commentId}`, reviewer.headers, { resolved: true });
    expect(byReviewer.status).toBe(200);
    expect(byReviewer.body.resolvedBy.id).toBe(reviewer.user.id);
    expect((await call('patch', `/api/comments/${one.commentId}`, one.educator.headers, { resolved: false })).status).toBe(200);
  });
});

describe('a person with a different role at each venue', () => {
  let both: VenueMember;

  beforeAll(async () => {
    const curatorAtOne = await memberAt(t, one.venue.id, ['curator']);
    both = await memberAt(t, two.venue.id, ['educator'], [], curatorAtOne.user);
  });

  it('writes at the venue where they curate and reviews where they educate, not the reverse', async () => {
    const mine = await call('post', '/api/stories', both.headers, { title: 'Curated at one', venueId: one.venue.id });
    expect(mine.status).toBe(201);
    expect(mine.body.can.edit).toBe(true);
    const unnamed = await call('post', '/api/stories', both.headers, { title: 'Where?' });
    expect(unnamed.status).toBe(201);
    expect((await t.app.get<typeof Story>(getModelToken(Story)).findByPk(unnamed.body.id))!.venueId).toBe(one.venue.id);
    expect((await call('post', '/api/stories', both.headers, { title: 'Not here', venueId: two.venue.id })).status).toBe(422);

    const atTwo = await call('get', `/api/stories/${two.draft.storyId}`, both.headers);
    expect(atTwo.status).toBe(200);
    expect(atTwo.body.can.edit).toBe(false);
    expect((await call('patch', `/api/stories/${two.draft.storyId}`, both.headers, { title: 'Edited from afar' })).status).toBe(403);
    expect((await call('patch', `/api/media/${two.imageId}`, both.headers, { credit: 'Edited from afar' })).status).toBe(403);

    const atOne = await call('get', `/api/revisions/${one.revisionId}`, both.headers);
    expect(atOne.body.can.approve).toBe(false);
    expect((await call('post', `/api/revisions/${one.revisionId}/reviews`, both.headers, { verdict: 'approve' })).status).toBe(403);

    const queue = (await call('get', '/api/reviews/queue?pageSize=100', both.headers)).body;
    expect(queue.items.map((item: { revisionId: number }) => item.revisionId)).toContain(two.revisionId);
    expect(queue.items.map((item: { revisionId: number }) => item.revisionId)).not.toContain(one.revisionId);
    expect((await call('get', `/api/revisions/${two.revisionId}`, both.headers)).body.can.approve).toBe(true);
    expect((await call('post', `/api/revisions/${two.revisionId}/reviews`, both.headers, { verdict: 'request_changes', note: 'The date needs a source.' })).status).toBe(201);
  });
});

describe('who hears of a venue’s work', () => {
  it('finds the people holding a role at a venue: members there and those who hold it everywhere', async () => {
    const everywhere = await createPerson(t, { roles: ['educator'] });
    const users = t.app.get(UsersService);
    const ids = async (venueId: number) => (await users.holdingAt(venueId, 'educator')).map((user) => user.id);
    expect(await ids(one.venue.id)).toEqual(expect.arrayContaining([one.educator.user.id, everywhere.id]));
    expect(await ids(one.venue.id)).not.toContain(two.educator.user.id);
    expect(await ids(one.venue.id)).not.toContain(one.curator.user.id);
    expect(await ids(two.venue.id)).toEqual(expect.arrayContaining([two.educator.user.id, everywhere.id]));
  });

  it('tells the educators of the story’s venue of a submission, not another venue’s', async () => {
    const story = await storyWithPanels(t, one.curator.headers, one.exhibit.id, [paragraphDoc('Ridges stand high because they are hot.')]);
    const { revisionId } = await submit(t, one.curator.headers, story.storyId);
    const told = await t.app.get<typeof Notification>(getModelToken(Notification)).findAll({ where: { link: `/reviews/${revisionId}` } });
    const recipients = told.map((notification) => notification.recipientId);
    expect(recipients).toContain(one.educator.user.id);
    expect(recipients).not.toContain(two.educator.user.id);
  });
});
