import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SearchView } from '@mantlepiece/shared';
import { signedInAs } from './authoring-fixtures.js';
import { createReviewApp, libraryImage, reviewVenue } from './review-fixtures.js';
import { createPerson, type TestApp } from './test-app.js';
import { memberAt, type VenueMember } from './venue-fixtures.js';

let t: TestApp;
/** A word of this run's own, so no other suite's rows are found. */
const word = `Zircon${Math.random().toString(36).slice(2, 8)}`;
let venueA: number;
let venueB: number;
let curatorA: VenueMember;
let curatorB: VenueMember;
let adminA: VenueMember;
let translatorA: VenueMember;
const ids = { storiesA: [] as number[], storyB: 0, mediaA: 0, mediaB: 0, personA: 0, personB: 0 };

const search = (who: Record<string, string>, query: Record<string, string | number>) => request(t.http).get('/api/search').query(query).set(who);
const found = (view: SearchView, kind: keyof SearchView) => view[kind]?.items.map((hit) => hit.id).sort((a, b) => a - b);

beforeAll(async () => {
  t = await createReviewApp();
  venueA = (await reviewVenue(t, 'search-a')).venue.id;
  venueB = (await reviewVenue(t, 'search-b')).venue.id;
  curatorA = await memberAt(t, venueA, ['curator']);
  curatorB = await memberAt(t, venueB, ['curator']);
  adminA = await memberAt(t, venueA, ['admin']);
  translatorA = await memberAt(t, venueA, ['translator'], ['fr']);
  for (const title of [`${word} ridges`, `${word} trenches`, `${word} hotspots`]) {
    ids.storiesA.push((await request(t.http).post('/api/stories').set(curatorA.headers).send({ title, venueId: venueA })).body.id);
  }
  ids.storyB = (await request(t.http).post('/api/stories').set(curatorB.headers).send({ title: `${word} at the other venue`, venueId: venueB })).body.id;
  ids.mediaA = await libraryImage(t, curatorA.headers, venueA, { credit: `Drawing: ${word} studio` });
  ids.mediaB = await libraryImage(t, curatorB.headers, venueB, { credit: `Drawing: ${word} studio` });
  ids.personA = (await memberAt(t, venueA, ['educator'], [], await createPerson(t, { roles: [], name: `${word} Educator A` }))).user.id;
  ids.personB = (await memberAt(t, venueB, ['educator'], [], await createPerson(t, { roles: [], name: `${word} Educator B` }))).user.id;
});
afterAll(() => t.close());

describe('GET /api/search', () => {
  it('finds a curator’s own venue’s stories and images, never another venue’s, and no people', async () => {
    const res = await search(curatorA.headers, { q: word, pageSize: 20 });
    expect(res.status).toBe(200);
    expect(found(res.body, 'stories')).toEqual([...ids.storiesA].sort((a, b) => a - b));
    expect(found(res.body, 'media')).toEqual([ids.mediaA]);
    expect(res.body.people).toBeUndefined();
    expect(res.body.stories.items).toContainEqual({ id: ids.storiesA[0], label: `${word} ridges`, detail: null });

    const other = await search(curatorB.headers, { q: word, pageSize: 20 });
    expect(found(other.body, 'stories')).toEqual([ids.storyB]);
    expect(found(other.body, 'media')).toEqual([ids.mediaB]);
  });

  it('finds people for a venue admin among their venue’s members only, and for the organisation admin everywhere', async () => {
    const venueAdmin = await search(adminA.headers, { q: word, kind: 'people' });
    expect(venueAdmin.status).toBe(200);
    expect(found(venueAdmin.body, 'people')).toEqual([ids.personA]);
    expect(venueAdmin.body.stories).toBeUndefined();

    const organisationAdmin = await search(await signedInAs(t, 'admin'), { q: word, kind: 'people' });
    expect(found(organisationAdmin.body, 'people')).toEqual([ids.personA, ids.personB].sort((a, b) => a - b));
  });

  it('gives a translator their venue’s stories and images as the lists do, and no people', async () => {
    const res = await search(translatorA.headers, { q: word, pageSize: 20 });
    expect(res.status).toBe(200);
    expect(found(res.body, 'stories')).toEqual([...ids.storiesA].sort((a, b) => a - b));
    expect(res.body.people).toBeUndefined();
  });

  it('pages through one kind, the total counting every hit', async () => {
    const first = await search(curatorA.headers, { q: word, kind: 'stories', pageSize: 2 });
    const second = await search(curatorA.headers, { q: word, kind: 'stories', pageSize: 2, page: 2 });
    expect(first.body.stories).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    expect(first.body.stories.items).toHaveLength(2);
    expect(second.body.stories.items).toHaveLength(1);
    expect(new Set([...first.body.stories.items, ...second.body.stories.items].map((hit: { id: number }) => hit.id)).size).toBe(3);
    expect(first.body.media).toBeUndefined();
  });

  it.each([
    ['no words', {}, 'q'],
    ['one letter', { q: 'a' }, 'q'],
    ['only spaces', { q: '     ' }, 'q'],
    ['101 characters', { q: 'x'.repeat(101) }, 'q'],
    ['an unknown kind', { q: word, kind: 'galleries' }, 'kind'],
    ['21 hits a page', { q: word, pageSize: 21 }, 'pageSize'],
    ['page 0', { q: word, page: 0 }, 'page'],
  ])('answers 400 naming the field for %s', async (_label, query, field) => {
    const res = await search(curatorA.headers, query);
    expect(res.status).toBe(400);
    expect(res.body.errors).toContainEqual(expect.objectContaining({ path: [field] }));
  });

  it('answers 401 without a sign-in', async () => {
    expect((await request(t.http).get('/api/search').query({ q: word })).status).toBe(401);
  });

  it('reads % and _ as themselves, not as patterns', async () => {
    const res = await search(curatorA.headers, { q: '%%', pageSize: 20 });
    expect(res.status).toBe(200);
    expect(found(res.body, 'stories')).toEqual([]);
  });
});
