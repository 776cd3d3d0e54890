import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { galleryWithExhibit, signedInAs } from '../../test/authoring-fixtures.js';
import { createTestApp, type TestApp } from '../../test/test-app.js';

let t: TestApp;
let admin: Record<string, string>;

beforeAll(async () => {
  t = await createTestApp();
  admin = await signedInAs(t, 'admin');
});
afterAll(() => t.close());

describe('Settings: venues, galleries, stations, exhibits', () => {
  it('refuses venue locales that are not BCP 47 and a target that repeats the source, naming the field', async () => {
    const bad = await request(t.http).post('/api/venues').set(admin).send({ name: 'Bad', slug: 'bad-locales', sourceLocale: 'en', targetLocales: ['fr', 'not a tag!'] });
    expect(bad.status).toBe(400);
    expect(bad.body.errors).toEqual([{ path: ['targetLocales'], message: expect.stringMatching(/BCP 47/) }]);
    const same = await request(t.http).post('/api/venues').set(admin).send({ name: 'Same', slug: 'same-locales', sourceLocale: 'en', targetLocales: ['en'] });
    expect(same.body.errors).toEqual([{ path: ['targetLocales', 0], message: 'The source locale cannot also be a target locale.' }]);
  });

  it('refuses a second venue with the same key with 409', async () => {
    const body = { name: 'Keyed', slug: `keyed-${Date.now()}`, sourceLocale: 'en', targetLocales: [] };
    expect((await request(t.http).post('/api/venues').set(admin).send(body)).status).toBe(201);
    expect((await request(t.http).post('/api/venues').set(admin).send(body)).status).toBe(409);
  });

  it('creates a station with its screen, lists it under its gallery, and edits it', async () => {
    const { gallery } = await galleryWithExhibit(t, admin, 'stations');
    const station = await request(t.http).post('/api/stations').set(admin)
      .send({ galleryId: gallery.id, name: 'Trench Wall', screenWidthPx: 1080, screenHeightPx: 1920, orientation: 'portrait', mountingHeightMm: 1100 });
    expect(station.status).toBe(201);
    const list = await request(t.http).get(`/api/stations?galleryId=${gallery.id}`).set(admin);
    expect(list.body).toMatchObject({ total: 1, items: [{ id: station.body.id, name: 'Trench Wall', orientation: 'portrait' }] });
    const edited = await request(t.http).patch(`/api/stations/${station.body.id}`).set(admin).send({ mountingHeightMm: 900 });
    expect(edited.body.mountingHeightMm).toBe(900);
  });

  it('refuses an exhibit that ends before it starts', async () => {
    const { gallery } = await galleryWithExhibit(t, admin, 'dates');
    const res = await request(t.http).post('/api/exhibits').set(admin).send({ galleryId: gallery.id, name: 'Backwards', plannedStart: '2027-05-01', plannedEnd: '2027-04-01' });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ path: ['plannedEnd'], message: expect.any(String) }]);
  });

  it('refuses with 409 to delete what is in use: a venue with galleries, a gallery with exhibits, an exhibit with stories', async () => {
    const { venue, gallery, exhibit } = await galleryWithExhibit(t, admin, 'in-use');
    const curator = await signedInAs(t, 'curator');
    const story = (await request(t.http).post('/api/stories').set(curator).send({ title: 'Keeps the exhibit', exhibitId: exhibit.id })).body;
    expect((await request(t.http).delete(`/api/venues/${venue.id}`).set(admin)).status).toBe(409);
    expect((await request(t.http).delete(`/api/galleries/${gallery.id}`).set(admin)).status).toBe(409);
    expect((await request(t.http).delete(`/api/exhibits/${exhibit.id}`).set(admin)).status).toBe(409);

    await request(t.http).delete(`/api/stories/${story.id}`).set(curator);
    expect((await request(t.http).delete(`/api/exhibits/${exhibit.id}`).set(admin)).status).toBe(204);
    expect((await request(t.http).delete(`/api/galleries/${gallery.id}`).set(admin)).status).toBe(204);
    expect((await request(t.http).delete(`/api/venues/${venue.id}`).set(admin)).status).toBe(204);
  });

  it('lets staff read and only admins write', async () => {
    const curator = await signedInAs(t, 'curator');
    expect((await request(t.http).get('/api/venues').set(curator)).status).toBe(200);
    expect((await request(t.http).post('/api/venues').set(curator).send({ name: 'x', slug: 'x', sourceLocale: 'en', targetLocales: [] })).status).toBe(403);
  });
});
