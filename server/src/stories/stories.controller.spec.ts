import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { galleryWithExhibit, signedInAs } from '../../test/authoring-fixtures.js';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { Story } from './models/story.model.js';

let t: TestApp;
let curator: Record<string, string>;
let venueId: number;
let exhibitId: number;
let otherExhibitId: number;

beforeAll(async () => {
  t = await createTestApp();
  curator = await signedInAs(t, 'curator');
  const admin = await signedInAs(t, 'admin');
  const place = await galleryWithExhibit(t, admin, 'stories');
  venueId = place.venue.id;
  exhibitId = place.exhibit.id;
  otherExhibitId = (await galleryWithExhibit(t, admin, 'stories-other')).exhibit.id;
});
afterAll(() => t.close());

const createStory = async (body: Record<string, unknown>) => {
  const res = await request(t.http).post('/api/stories').set(curator).send(body);
  if (res.status !== 201) throw new Error(`expected 201, got ${res.status} ${JSON.stringify(res.body)}`);
  return res.body;
};

describe('POST /api/stories', () => {
  it('creates a draft for a family audience in the venue’s language, with its author and exhibit', async () => {
    const story = await createStory({ title: '  Rock that flows  ', exhibitId });
    expect(story).toMatchObject({
      title: 'Rock that flows', audience: 'family', sourceLocale: 'en', state: 'draft', exhibitId, exhibitName: 'stories exhibit', panelCount: 0,
      createdBy: { id: expect.any(Number), name: 'Suite Person' },
    });
  });

  it('refuses a source locale that is not BCP 47, naming the field, and stores a valid one in canonical form', async () => {
    const bad = await request(t.http).post('/api/stories').set(curator).send({ title: 'x', sourceLocale: 'english please' });
    expect(bad.status).toBe(400);
    expect(bad.body.errors).toEqual([{ path: ['sourceLocale'], message: expect.stringMatching(/BCP 47/) }]);
    expect((await createStory({ title: 'Canonical', sourceLocale: 'pt-br', venueId })).sourceLocale).toBe('pt-BR');
  });

  it('refuses a translator with 403', async () => {
    const translator = await signedInAs(t, 'translator');
    const res = await request(t.http).post('/api/stories').set(translator).send({ title: 'Not mine to write' });
    expect(res.status).toBe(403);
  });
});

describe('GET /api/stories', () => {
  beforeAll(async () => {
    for (const [title, audience] of [['Alpha slab', 'school'], ['Bravo ridge', 'family'], ['Charlie plume', 'adult'], ['Delta trench', 'family'], ['Echo rift', 'school']] as const) {
      await createStory({ title: `${title} listing`, audience, exhibitId: otherExhibitId });
    }
  });

  it('pages in the database: total counts every match, each page holds pageSize of them', async () => {
    const first = await request(t.http).get(`/api/stories?exhibitId=${otherExhibitId}&pageSize=2&page=1&sort=title`).set(curator);
    const third = await request(t.http).get(`/api/stories?exhibitId=${otherExhibitId}&pageSize=2&page=3&sort=title`).set(curator);
    expect(first.body).toMatchObject({ total: 5, page: 1, pageSize: 2 });
    expect(first.body.items.map((s: { title: string }) => s.title)).toEqual(['Alpha slab listing', 'Bravo ridge listing']);
    expect(third.body.items.map((s: { title: string }) => s.title)).toEqual(['Echo rift listing']);
  });

  it('filters by audience, state and words in the title', async () => {
    const family = await request(t.http).get(`/api/stories?exhibitId=${otherExhibitId}&audience=family&sort=-title`).set(curator);
    expect(family.body.items.map((s: { title: string }) => s.title)).toEqual(['Delta trench listing', 'Bravo ridge listing']);
    const searched = await request(t.http).get('/api/stories?q=plume%20listing').set(curator);
    expect(searched.body.items.map((s: { title: string }) => s.title)).toEqual(['Charlie plume listing']);
    const inReview = await request(t.http).get(`/api/stories?exhibitId=${otherExhibitId}&state=in_review`).set(curator);
    expect(inReview.body.total).toBe(0);
  });

  it('takes % and _ in a search literally', async () => {
    const res = await request(t.http).get('/api/stories?q=%25').set(curator);
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(0);
  });

  it('refuses a sort field that is not on the list', async () => {
    const res = await request(t.http).get('/api/stories?sort=created_by_id').set(curator);
    expect(res.status).toBe(400);
    expect(res.body.errors[0].path).toEqual(['sort']);
  });

  it('lets every staff role read', async () => {
    const educator = await signedInAs(t, 'educator');
    expect((await request(t.http).get('/api/stories').set(educator)).status).toBe(200);
  });
});

describe('PATCH and DELETE /api/stories/:id', () => {
  it('changes the title and audience', async () => {
    const story = await createStory({ title: 'Before', venueId });
    const res = await request(t.http).patch(`/api/stories/${story.id}`).set(curator).send({ title: 'After', audience: 'adult' });
    expect(res.body).toMatchObject({ id: story.id, title: 'After', audience: 'adult' });
  });

  it('deletes a story that was never released, and refuses with 409 once a release carried it', async () => {
    const draft = await createStory({ title: 'Short-lived', venueId });
    expect((await request(t.http).delete(`/api/stories/${draft.id}`).set(curator)).status).toBe(204);
    expect((await request(t.http).get(`/api/stories/${draft.id}`).set(curator)).status).toBe(404);

    const released = await createStory({ title: 'On the gallery floor', venueId });
    await t.app.get<typeof Story>(getModelToken(Story)).update({ releasedAt: new Date() }, { where: { id: released.id } });
    const res = await request(t.http).delete(`/api/stories/${released.id}`).set(curator);
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/released/);
  });
});
