import { Logger } from '@nestjs/common';
import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { galleryWithExhibit } from './authoring-fixtures.js';
import { pairedKiosk } from './release-fixtures.js';
import { member, type Headers } from './review-fixtures.js';
import { createTestApp, type TestApp } from './test-app.js';

let t: TestApp;
let admin: Headers;
let curator: Headers;
let technician: Headers;
let device: Headers;
let place: Awaited<ReturnType<typeof galleryWithExhibit>>;
let stationId: number;
let storyId: number;
let userId: number;

/** Every 5xx the filter logs goes through Logger#error; a 4xx must leave the log alone. */
const loggedErrors = vi.spyOn(Logger.prototype, 'error');

beforeAll(async () => {
  t = await createTestApp();
  admin = (await member(t, ['admin'])).auth;
  curator = (await member(t, ['curator'])).auth;
  technician = (await member(t, ['technician'])).auth;
  const someone = await member(t, ['educator']);
  userId = someone.person.id;
  place = await galleryWithExhibit(t, admin, 'hostile');
  const kiosk = await pairedKiosk(t, admin, technician, place.gallery.id);
  device = kiosk.device;
  stationId = kiosk.station.id;
  storyId = (await request(t.http).post('/api/stories').set(curator).send({ title: 'Hostile input', exhibitId: place.exhibit.id })).body.id;
});
afterAll(() => t?.close());
afterEach(() => {
  const logged = loggedErrors.mock.calls.map(([message]) => String(message).split('\n')[0]);
  loggedErrors.mockClear();
  expect(logged).toEqual([]);
});

/** A 400 whose `errors` name `field` (a path of one step, or the first steps of a longer one). */
function expectFieldRefused(res: request.Response, status: number, field: string) {
  expect({ status: res.status, paths: (res.body.errors ?? []).map((e: { path: unknown[] }) => e.path[0]) }).toEqual({ status, paths: expect.arrayContaining([field]) });
}

const HEARTBEAT = { releaseId: null, appVersion: '0.1.0', uptimeS: 60, storageUsedBytes: 1_000, lastError: null };

describe('deeply nested JSON', () => {
  const nested = (depth: number) => '['.repeat(depth) + ']'.repeat(depth);
  const nestedObject = (depth: number) => '{"a":'.repeat(depth) + '1' + '}'.repeat(depth);

  it('answers a body nested 2000 levels deep with 400 and the JSON error body, logging no stack', async () => {
    for (const body of [`{"email":${nested(2000)},"password":"x"}`, nestedObject(2000)]) {
      const res = await request(t.http).post('/api/auth/login').set('Content-Type', 'application/json').send(body);
      expect(res.status).toBe(400);
      expect(res.body).toEqual({ statusCode: 400, message: expect.stringMatching(/nested too deeply/) });
    }
  });

  it('refuses deep nesting inside a value the DTO leaves open (a panel document, widget parameters)', async () => {
    const panel = await request(t.http).post(`/api/stories/${storyId}/panels`).set(curator).set('Content-Type', 'application/json').send(`{"doc":${nestedObject(2000)}}`);
    expect(panel.status).toBe(400);
    const widget = await request(t.http).post('/api/widgets/validate').set(curator).set('Content-Type', 'application/json').send(`{"type":"slope-force","params":${nested(5000)}}`);
    expect(widget.status).toBe(400);
  });

  it('still takes brackets and braces inside strings at any count', async () => {
    const res = await request(t.http).post('/api/auth/login').send({ email: `${'['.repeat(150)}@example.org`, password: '{'.repeat(200) });
    expect(res.status).toBe(401);
  });
});

describe('paging', () => {
  const lists = () => [
    '/api/venues', '/api/galleries', '/api/stations', '/api/exhibits', '/api/stories', '/api/media', '/api/users', '/api/audit',
    '/api/notifications', '/api/translations/stories', '/api/kiosks', `/api/galleries/${place.gallery.id}/releases`,
  ];

  it('answers ?page=99999999999999999999 with 400 naming page on every list', async () => {
    for (const path of lists()) {
      const res = await request(t.http).get(`${path}?page=99999999999999999999`).set(admin);
      expect({ path, status: res.status, errors: res.body.errors }).toEqual({ path, status: 400, errors: [{ path: ['page'], message: expect.any(String) }] });
    }
  });

  it('answers a page size, negative page or fractional page out of bounds with 400', async () => {
    for (const query of ['page=-1', 'page=0', 'page=1.5', 'page=1e3', 'page=0x10', 'page=%201', 'page=', 'page=1&page=2', 'pageSize=1000000', 'page=NaN', 'page=Infinity']) {
      const res = await request(t.http).get(`/api/venues?${query}`).set(admin);
      expect({ query, status: res.status }).toEqual({ query, status: 400 });
    }
  });

  it('still answers the last page a list can reach', async () => {
    const res = await request(t.http).get('/api/venues?page=1000').set(admin);
    expect(res.status).toBe(200);
    expect(res.body.items).toEqual([]);
  });
});

describe('integers bounded by their column', () => {
  it('refuses a venueId or galleryId of 2^53 or 1e308', async () => {
    for (const id of [2 ** 53, 1e308, 2147483648]) {
      expectFieldRefused(await request(t.http).post('/api/galleries').set(admin).send({ venueId: id, name: 'Big' }), 400, 'venueId');
      expectFieldRefused(await request(t.http).post('/api/exhibits').set(admin).send({ galleryId: id, name: 'Big' }), 400, 'galleryId');
      expectFieldRefused(await request(t.http).get(`/api/galleries?venueId=${id}`).set(admin), 400, 'venueId');
    }
  });

  it('refuses heartbeat numbers beyond their columns', async () => {
    const cases: [string, number][] = [['releaseId', 2147483648], ['uptimeS', 4294967296], ['storageUsedBytes', 1e308], ['storageUsedBytes', 2 ** 53]];
    for (const [field, value] of cases) {
      expectFieldRefused(await request(t.http).post('/api/kiosk/heartbeat').set(device).send({ ...HEARTBEAT, [field]: value }), 400, field);
    }
  });

  it('still takes the largest values the columns hold', async () => {
    const res = await request(t.http).post('/api/kiosk/heartbeat').set(device).send({ ...HEARTBEAT, uptimeS: 4294967295, storageUsedBytes: Number.MAX_SAFE_INTEGER });
    expect(res.status).toBe(204);
  });
});

describe('null where a value is required', () => {
  const patches = () => [
    ['PATCH', `/api/venues/${place.venue.id}`, 'name', admin],
    ['PATCH', `/api/galleries/${place.gallery.id}`, 'name', admin],
    ['PATCH', `/api/stations/${stationId}`, 'name', admin],
    ['PATCH', `/api/stations/${stationId}`, 'screenWidthPx', admin],
    ['PATCH', `/api/exhibits/${place.exhibit.id}`, 'name', admin],
    ['PATCH', `/api/stories/${storyId}`, 'title', curator],
    ['PATCH', `/api/stories/${storyId}`, 'audience', curator],
    ['PATCH', `/api/users/${userId}`, 'name', admin],
    ['PATCH', `/api/users/${userId}`, 'roles', admin],
    ['PATCH', '/api/auth/me', 'name', curator],
    ['PATCH', '/api/auth/me', 'uiLanguage', curator],
    ['POST', '/api/venues', 'requiredApprovals', admin],
  ] as const;

  it('refuses null for a required value with 400 naming the field', async () => {
    for (const [method, path, field, auth] of patches()) {
      const res = await request(t.http)[method === 'PATCH' ? 'patch' : 'post'](path).set(auth)
        .send({ ...(method === 'POST' ? { name: 'Null venue', slug: 'null-venue', sourceLocale: 'en', targetLocales: [] } : {}), [field]: null });
      const named = [...new Set((res.body.errors ?? []).map((e: { path: unknown[] }) => e.path.join('.')))];
      expect({ path, field, status: res.status, named }).toEqual({ path, field, status: 400, named: [field] });
    }
  });

  it('still takes null where it clears a value', async () => {
    const res = await request(t.http).patch(`/api/exhibits/${place.exhibit.id}`).set(admin).send({ plannedStart: null });
    expect(res.status).toBe(200);
    const story = await request(t.http).patch(`/api/stories/${storyId}`).set(curator).send({ exhibitId: null });
    expect(story.status).toBe(200);
    await request(t.http).patch(`/api/stories/${storyId}`).set(curator).send({ exhibitId: place.exhibit.id });
  });
});

describe('text that is not well-formed Unicode', () => {
  // A lone surrogate cannot be written as UTF-8; JSON's \u escape is the only way in.
  const loneSurrogate = '{"email":"ab\\ud800c@example.org"}';

  it('refuses a lone surrogate in a password reset with 400 naming the field', async () => {
    const res = await request(t.http).post('/api/auth/password-reset').set('Content-Type', 'application/json').send(loneSurrogate);
    expectFieldRefused(res, 400, 'email');
  });

  it('refuses a lone surrogate in an invitation', async () => {
    const body = '{"email":"new\\udc00@example.org","name":"Lone \\ud83d","roles":["curator"],"locales":[]}';
    const res = await request(t.http).post('/api/users/invitations').set(admin).set('Content-Type', 'application/json').send(body);
    expectFieldRefused(res, 400, 'email');
    expectFieldRefused(res, 400, 'name');
  });

  it('refuses one in an object key', async () => {
    const key = await request(t.http).put('/api/notifications/preferences').set(curator).set('Content-Type', 'application/json').send('{"\\ud800":{"email":true}}');
    expect(key.status).toBe(400);
  });

  it('reads a query whose bytes are not UTF-8 with replacement characters, so no lone surrogate gets in', async () => {
    const res = await request(t.http).get('/api/stories?q=%ED%A0%80').set(admin);
    expect(res.status).toBe(200);
  });

  it('still takes a well-formed pair (an emoji)', async () => {
    const res = await request(t.http).patch(`/api/stories/${storyId}`).set(curator).send({ title: 'Lava 🌋 rises' });
    expect(res.status).toBe(200);
  });
});

describe('references to rows that do not exist', () => {
  it('answers a heartbeat naming a release that does not exist with 422 naming releaseId', async () => {
    expectFieldRefused(await request(t.http).post('/api/kiosk/heartbeat').set(device).send({ ...HEARTBEAT, releaseId: 2147483647 }), 422, 'releaseId');
  });

  it('answers a body naming a parent that does not exist with 422 naming the field', async () => {
    expectFieldRefused(await request(t.http).post('/api/galleries').set(admin).send({ venueId: 2147483647, name: 'Nowhere' }), 422, 'venueId');
    expectFieldRefused(await request(t.http).post('/api/exhibits').set(admin).send({ galleryId: 2147483647, name: 'Nowhere' }), 422, 'galleryId');
    expectFieldRefused(await request(t.http).post('/api/stations').set(admin).send({
      galleryId: 2147483647, name: 'Nowhere', screenWidthPx: 1920, screenHeightPx: 1080, orientation: 'landscape', mountingHeightMm: 1000,
    }), 422, 'galleryId');
    expectFieldRefused(await request(t.http).post('/api/stories').set(curator).send({ title: 'Nowhere', exhibitId: 2147483647 }), 422, 'exhibitId');
    expectFieldRefused(await request(t.http).patch(`/api/stories/${storyId}`).set(curator).send({ exhibitId: 2147483647 }), 422, 'exhibitId');
  });
});

describe('arrays where objects belong', () => {
  it('refuses an array as a kiosk event', async () => {
    const res = await request(t.http).post('/api/kiosk/events').set(device).send({ events: [[]] });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ path: ['events'], message: 'Each item must be an object.' }]);
  });

  it('refuses an array as a notification preference', async () => {
    expectFieldRefused(await request(t.http).put('/api/notifications/preferences').set(curator).send({ verdict: [] }), 400, 'verdict');
  });

  it('refuses an array or a string as the body itself', async () => {
    for (const body of ['[]', '[{"email":"a@b.c"}]', '"text"', '42', 'null']) {
      const res = await request(t.http).post('/api/auth/password-reset').set('Content-Type', 'application/json').send(body);
      expect({ body, status: res.status }).toEqual({ body, status: 400 });
    }
  });
});
