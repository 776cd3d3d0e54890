import { parse } from 'csv-parse/sync';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import type { Role } from '@mantlepiece/shared';
import { galleryWithExhibit, paragraphDoc } from './authoring-fixtures.js';
import { approve, buildRelease } from './release-fixtures.js';
import { member, storyWithPanels, type Headers } from './review-fixtures.js';
import { createTestApp, SUITE_ADDRESS } from './test-app.js';
import { memberAt } from './venue-fixtures.js';

/**
 * Venues as boundaries on the operations side (issue 13): Settings, releases, kiosks and pairing,
 * the Fleet, Insights and the audit trail. Two venues of the suite's own, each with a gallery,
 * station, exhibit and a built release; people who belong to venue A only, and the organisation's
 * admin. Another venue's thing must answer exactly as a thing that does not exist.
 */
const t = await createTestApp();
afterAll(() => t.close());

const MISSING = 2_147_483_647;
const orgAdmin = await member(t, ['admin']);
const orgTechnician = await member(t, ['technician']);
const orgCurator = await member(t, ['curator']);
const orgEducator = await member(t, ['educator']);

async function venueWithRelease(label: string) {
  const { venue, gallery, exhibit } = await galleryWithExhibit(t, orgAdmin.auth, label);
  await request(t.http).patch(`/api/venues/${venue.id}`).set(orgAdmin.auth).send({ fallbackToSource: true });
  const story = await storyWithPanels(t, orgCurator.auth, exhibit.id, [paragraphDoc(`${label}: plates move.`)]);
  await approve(t, orgCurator.auth, orgEducator.auth, story.storyId);
  const release = await buildRelease(t, orgTechnician.auth, gallery.id);
  const station = (await request(t.http).post('/api/stations').set(orgAdmin.auth).send({
    galleryId: gallery.id, name: `${label} station`, screenWidthPx: 1920, screenHeightPx: 1080, orientation: 'landscape', mountingHeightMm: 1000,
  })).body;
  return { venue, gallery, exhibit, station, release };
}

const A = await venueWithRelease('ops-a');
const B = await venueWithRelease('ops-b');
const staffOfA: Record<string, Headers> = {
  technician: (await memberAt(t, A.venue.id, ['technician'])).headers,
  admin: (await memberAt(t, A.venue.id, ['admin'])).headers,
  curator: (await memberAt(t, A.venue.id, ['curator'])).headers,
  educator: (await memberAt(t, A.venue.id, ['educator'])).headers,
};

const get = (path: string, who: Headers) => request(t.http).get(path).set(who);

/** A kiosk showing a fresh pairing code, paired at `stationId` by `who`; the pairing answer and, if paired, the device's headers. */
async function pairAt(stationId: number, who: Headers) {
  const started = (await request(t.http).post('/api/kiosk/pair/start').set(SUITE_ADDRESS)).body;
  const paired = await request(t.http).post(`/api/stations/${stationId}/pair`).set(who).send({ pairingCode: started.pairingCode });
  if (paired.status !== 201) return { paired };
  const credential = (await request(t.http).post('/api/kiosk/pair/complete').send({ pollToken: started.pollToken })).body;
  return { paired, kioskId: credential.kioskId as number, device: { Authorization: `Bearer ${credential.deviceToken}` } };
}

/** Asks for venue B's thing and for a thing that does not exist: both must give the same 404 body. */
async function expectHidden(who: Headers, pathOfB: string, pathOfMissing: string, method: 'get' | 'post' | 'patch' | 'delete' = 'get', body?: object) {
  const ask = (path: string) => (body === undefined ? request(t.http)[method](path).set(who) : request(t.http)[method](path).set(who).send(body));
  const [ofB, missing] = [await ask(pathOfB), await ask(pathOfMissing)];
  expect({ path: pathOfB, status: ofB.status, body: ofB.body }).toEqual({ path: pathOfB, status: 404, body: missing.body });
  expect(missing.status).toBe(404);
}

describe('Settings: venues, galleries, stations and exhibits of one venue', () => {
  const lists: [string, (v: typeof A) => number][] = [
    ['venues', (v) => v.venue.id], ['galleries', (v) => v.gallery.id], ['stations', (v) => v.station.id], ['exhibits', (v) => v.exhibit.id],
  ];

  it.each(Object.keys(staffOfA))('shows a %s of venue A their venue only: lists and totals hold no other venue, another venue’s record is 404', async (role) => {
    const who = staffOfA[role]!;
    for (const [kind, idOf] of lists) {
      const list = await get(`/api/${kind}?pageSize=100`, who);
      expect(list.status).toBe(200);
      // Venue A has one of each: a member of A alone sees exactly that one, whatever other suites made.
      expect({ kind, total: list.body.total, ids: list.body.items.map((item: { id: number }) => item.id) }).toEqual({ kind, total: 1, ids: [idOf(A)] });
      expect((await get(`/api/${kind}/${idOf(A)}`, who)).status).toBe(200);
      await expectHidden(who, `/api/${kind}/${idOf(B)}`, `/api/${kind}/${MISSING}`);
    }
    // Narrowed to the other venue, a list is empty, not a way round the boundary.
    for (const kind of ['galleries', 'stations', 'exhibits']) expect((await get(`/api/${kind}?venueId=${B.venue.id}`, who)).body.total).toBe(0);
  });

  it('shows the organisation’s admin both venues, and narrows a list to one venue on ?venueId', async () => {
    const venues = await get('/api/venues?pageSize=100', orgAdmin.auth);
    expect(venues.body.items.map((v: { id: number }) => v.id)).toEqual(expect.arrayContaining([A.venue.id, B.venue.id]));
    const stations = await get(`/api/stations?venueId=${B.venue.id}`, orgAdmin.auth);
    expect(stations.body).toMatchObject({ total: 1, items: [{ id: B.station.id }] });
  });

  it('lets venue A’s admin change venue A and its galleries, stations and exhibits, and refuses venue B’s as if they did not exist', async () => {
    const admin = staffOfA.admin!;
    expect((await request(t.http).patch(`/api/venues/${A.venue.id}`).set(admin).send({ requiredApprovals: 2 })).status).toBe(200);
    await expectHidden(admin, `/api/venues/${B.venue.id}`, `/api/venues/${MISSING}`, 'patch', { requiredApprovals: 2 });
    for (const [kind, id] of [['galleries', B.gallery.id], ['stations', B.station.id], ['exhibits', B.exhibit.id]] as const) {
      await expectHidden(admin, `/api/${kind}/${id}`, `/api/${kind}/${MISSING}`, 'patch', { name: 'Taken over' });
      await expectHidden(admin, `/api/${kind}/${id}`, `/api/${kind}/${MISSING}`, 'delete');
    }
    const gallery = await request(t.http).post('/api/galleries').set(admin).send({ venueId: A.venue.id, name: 'Second hall of A' });
    expect(gallery.status).toBe(201);
    expect((await request(t.http).patch(`/api/exhibits/${A.exhibit.id}`).set(admin).send({ name: 'Renamed by A’s admin' })).status).toBe(200);
    expect((await request(t.http).delete(`/api/galleries/${gallery.body.id}`).set(admin)).status).toBe(204);
  });

  it('refuses a new record under venue B’s venue or gallery exactly as one under a venue or gallery that does not exist (422 naming the field)', async () => {
    const admin = staffOfA.admin!;
    const station = { name: 'Intruder', screenWidthPx: 1920, screenHeightPx: 1080, orientation: 'landscape', mountingHeightMm: 1000 };
    const cases = [
      ['/api/galleries', { venueId: B.venue.id, name: 'Intruder' }, { venueId: MISSING, name: 'Intruder' }],
      ['/api/stations', { ...station, galleryId: B.gallery.id }, { ...station, galleryId: MISSING }],
      ['/api/exhibits', { galleryId: B.gallery.id, name: 'Intruder' }, { galleryId: MISSING, name: 'Intruder' }],
    ] as const;
    for (const [path, ofB, missing] of cases) {
      const refused = await request(t.http).post(path).set(admin).send(ofB);
      // The organisation's admin naming a row that does not exist: the database's own refusal, as the API filter words it.
      const unknown = await request(t.http).post(path).set(orgAdmin.auth).send(missing);
      expect({ path, status: refused.status, body: refused.body }).toEqual({ path, status: 422, body: unknown.body });
    }
  });

  it('leaves adding and removing venues to the organisation’s admin', async () => {
    const admin = staffOfA.admin!;
    const body = { name: 'Venue of their own', slug: `own-${Math.random().toString(36).slice(2, 8)}`, sourceLocale: 'en', targetLocales: [] };
    expect((await request(t.http).post('/api/venues').set(admin).send(body)).status).toBe(403);
    expect((await request(t.http).delete(`/api/venues/${A.venue.id}`).set(admin)).status).toBe(403);
    const created = await request(t.http).post('/api/venues').set(orgAdmin.auth).send(body);
    expect(created.status).toBe(201);
    expect((await request(t.http).delete(`/api/venues/${created.body.id}`).set(orgAdmin.auth)).status).toBe(204);
  });

  it('refuses a change (403) to someone who sees the venue but does not keep its settings there', async () => {
    const person = await memberAt(t, A.venue.id, ['admin']);
    const curatorAtB = await memberAt(t, B.venue.id, ['curator'], [], person.user);
    expect((await get(`/api/galleries/${B.gallery.id}`, curatorAtB.headers)).status).toBe(200);
    expect((await request(t.http).patch(`/api/galleries/${B.gallery.id}`).set(curatorAtB.headers).send({ name: 'Not theirs' })).status).toBe(403);
    expect((await request(t.http).patch(`/api/venues/${B.venue.id}`).set(curatorAtB.headers).send({ requiredApprovals: 2 })).status).toBe(403);
  });
});

describe('releases of one venue', () => {
  it.each(Object.keys(staffOfA))('shows a %s of venue A the releases of A’s gallery; B’s gallery, release, manifest, comparison and signing key are 404', async (role) => {
    const who = staffOfA[role]!;
    const list = await get(`/api/galleries/${A.gallery.id}/releases`, who);
    expect(list.body).toMatchObject({ total: 1, items: [{ id: A.release.id }] });
    expect((await get(`/api/releases/${A.release.id}`, who)).status).toBe(200);
    await expectHidden(who, `/api/galleries/${B.gallery.id}/releases`, `/api/galleries/${MISSING}/releases`);
    await expectHidden(who, `/api/releases/${B.release.id}`, `/api/releases/${MISSING}`);
    await expectHidden(who, `/api/releases/${B.release.id}/manifest`, `/api/releases/${MISSING}/manifest`);
    await expectHidden(who, `/api/releases/compare?a=${A.release.id}&b=${B.release.id}`, `/api/releases/compare?a=${A.release.id}&b=${MISSING}`);
    expect((await get(`/api/venues/${A.venue.id}/signing-key`, who)).status).toBe(200);
    await expectHidden(who, `/api/venues/${B.venue.id}/signing-key`, `/api/venues/${MISSING}/signing-key`);
  });

  it('lets venue A’s technician build and publish in A only; in B the gallery and release do not exist for them', async () => {
    const technician = staffOfA.technician!;
    await expectHidden(technician, `/api/galleries/${B.gallery.id}/releases`, `/api/galleries/${MISSING}/releases`, 'post', {});
    await expectHidden(technician, `/api/releases/${B.release.id}/publish`, `/api/releases/${MISSING}/publish`, 'post');
    const published = await request(t.http).post(`/api/releases/${A.release.id}/publish`).set(technician);
    expect(published.body).toMatchObject({ id: A.release.id, state: 'live' });
    expect((await buildRelease(t, technician, A.gallery.id)).state).toBe('ready');
    expect((await get(`/api/releases/${B.release.id}`, orgTechnician.auth)).body.state).toBe('ready');
  });

  it('refuses (403) to build or publish where a person holds another role than technician', async () => {
    const person = await memberAt(t, A.venue.id, ['technician']);
    const curatorAtB = await memberAt(t, B.venue.id, ['curator'], [], person.user);
    const seen = await get(`/api/releases/${B.release.id}`, curatorAtB.headers);
    expect({ status: seen.status, can: seen.body.can }).toEqual({ status: 200, can: { publish: false } });
    expect((await request(t.http).post(`/api/releases/${B.release.id}/publish`).set(curatorAtB.headers)).status).toBe(403);
    expect((await request(t.http).post(`/api/galleries/${B.gallery.id}/releases`).set(curatorAtB.headers).send({})).status).toBe(403);
    expect((await get(`/api/galleries/${A.gallery.id}/releases`, curatorAtB.headers)).body.can).toEqual({ build: true });
  });
});

describe('kiosks, pairing and the Fleet of one venue', () => {
  it('lets venue A’s technician pair at A’s station only; B’s station answers as a station that does not exist', async () => {
    const technician = staffOfA.technician!;
    const own = await pairAt(A.station.id, technician);
    expect(own.paired.status).toBe(201);
    const atB = await pairAt(B.station.id, technician);
    const atMissing = await pairAt(MISSING, technician);
    expect({ status: atB.paired.status, body: atB.paired.body }).toEqual({ status: 404, body: atMissing.paired.body });
  });

  it('lists, shows and revokes the kiosks of venue A only, for A’s technician and admin', async () => {
    const ofA = await pairAt(A.station.id, orgTechnician.auth);
    const ofB = await pairAt(B.station.id, orgTechnician.auth);
    for (const who of [staffOfA.technician!, staffOfA.admin!]) {
      const fleet = await get('/api/kiosks?pageSize=100', who);
      const galleries = new Set(fleet.body.items.map((kiosk: { gallery: { id: number } }) => kiosk.gallery.id));
      expect({ galleries: [...galleries], counted: fleet.body.total === fleet.body.items.length }).toEqual({ galleries: [A.gallery.id], counted: true });
      expect(fleet.body.items.map((kiosk: { id: number }) => kiosk.id)).toContain(ofA.kioskId);
      expect((await get(`/api/kiosks?galleryId=${B.gallery.id}`, who)).body.total).toBe(0);
      expect((await get(`/api/kiosks?venueId=${B.venue.id}`, who)).body.total).toBe(0);
      expect((await get(`/api/kiosks/${ofA.kioskId}`, who)).status).toBe(200);
      await expectHidden(who, `/api/kiosks/${ofB.kioskId}`, `/api/kiosks/${MISSING}`);
      await expectHidden(who, `/api/kiosks/${ofB.kioskId}/revoke`, `/api/kiosks/${MISSING}/revoke`, 'post');
    }
    expect((await request(t.http).post(`/api/kiosks/${ofA.kioskId}/revoke`).set(staffOfA.technician!)).body.revokedAt).not.toBeNull();
    expect((await get(`/api/kiosks/${ofB.kioskId}`, orgTechnician.auth)).body.revokedAt).toBeNull();
  });

  it('answers a paired kiosk its own venue, whatever venue its install URL names', async () => {
    const ofB = await pairAt(B.station.id, orgTechnician.auth);
    const res = await request(t.http).get(`/api/kiosk/venue?slug=${A.venue.slug}`).set(ofB.device!);
    expect(res.body).toEqual({ name: B.venue.name, locales: ['en', 'fr'] });
    expect((await request(t.http).get(`/api/kiosk/venue?slug=${A.venue.slug}`)).body.name).toBe(A.venue.name);
  });
});

describe('Insights of one venue', () => {
  it.each(['technician', 'curator', 'educator', 'admin'] as Role[])('shows a %s of venue A the figures of A’s gallery; B’s gallery is as one that does not exist', async (role) => {
    const who = staffOfA[role]!;
    expect((await get(`/api/insights?galleryId=${A.gallery.id}`, who)).status).toBe(200);
    await expectHidden(who, `/api/insights?galleryId=${B.gallery.id}`, `/api/insights?galleryId=${MISSING}`);
    const csv = await get(`/api/insights?galleryId=${B.gallery.id}`, who).set('Accept', 'text/csv');
    expect(csv.status).toBe(404);
  });
});

describe('the audit trail of one venue', () => {
  it('shows venue A’s admin the events about venue A only, never another venue’s or organisation-wide ones, in JSON and CSV', async () => {
    const technician = staffOfA.technician!;
    const ofB = await pairAt(B.station.id, orgTechnician.auth);
    const ofA = await pairAt(A.station.id, technician);
    const admin = staffOfA.admin!;
    const trail = await get('/api/audit?pageSize=100', admin);
    expect(trail.status).toBe(200);
    const venues = new Set(trail.body.items.map((event: { venueId: number | null }) => event.venueId));
    expect({ venues: [...venues], counted: trail.body.total === trail.body.items.length }).toEqual({ venues: [A.venue.id], counted: true });
    expect(trail.body.items).toEqual(expect.arrayContaining([
      expect.objectContaining({ action: 'kiosk.paired', target: { type: 'kiosk', id: String(ofA.kioskId) }, venueId: A.venue.id }),
      expect.objectContaining({ action: 'release.requested', venueId: A.venue.id }),
    ]));
    expect((await get(`/api/audit?venueId=${B.venue.id}`, admin)).body.total).toBe(0);
    const csv: Record<string, string>[] = parse((await get('/api/audit', admin).set('Accept', 'text/csv')).text, { columns: true });
    expect([...new Set(csv.map((row) => row.venue_id))]).toEqual([String(A.venue.id)]);

    const everything = await get(`/api/audit?action=kiosk.paired&venueId=${B.venue.id}`, orgAdmin.auth);
    expect(everything.body.items).toEqual(expect.arrayContaining([expect.objectContaining({ target: { type: 'kiosk', id: String(ofB.kioskId) }, venueId: B.venue.id })]));
    const signIns = await get('/api/audit?action=auth.signed-in&pageSize=1', orgAdmin.auth);
    expect(signIns.body.items[0].venueId).toBeNull();
  });

  it('is not open to venue staff who are not admins', async () => {
    for (const role of ['technician', 'curator', 'educator']) expect((await get('/api/audit', staffOfA[role]!)).status).toBe(403);
  });
});
