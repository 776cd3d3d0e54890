import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseManifest } from '@mantlepiece/shared';
import { PAIRING_ALPHABET } from '@mantlepiece/shared';
import { approvedGallery, buildRelease, pairedKiosk, publish } from '../../test/release-fixtures.js';
import { ROLE_MATRIX } from '../../test/role-matrix.js';
import { createTestApp, SUITE_ADDRESS, TestClock, type TestApp } from '../../test/test-app.js';
import { sha256Of } from '../releases/release-file-store.js';
import { KioskEvent } from './models/kiosk-event.model.js';
import { KioskHeartbeat } from './models/kiosk-heartbeat.model.js';
import { PAIRING_TTL_MS } from './pairing.service.js';
import { PAIRING_MAX_FAILURES_PER_ADDRESS, PAIRING_MAX_FAILURES_PER_STATION } from './pairing-attempts.service.js';

const mediaDir = fs.mkdtempSync(path.join(os.tmpdir(), 'mantlepiece-kiosks-'));
const clock = new TestClock();
let t: TestApp;
let g: Awaited<ReturnType<typeof approvedGallery>>;

beforeAll(async () => {
  t = await createTestApp({ clock, env: { MEDIA_DIR: mediaDir } });
  g = await approvedGallery(t, 'kiosks');
});
afterAll(async () => {
  await t.close();
  fs.rmSync(mediaDir, { recursive: true, force: true });
});

/** Each throttle test comes from an address of its own (RFC 5737 documentation range), through the loopback proxy hop. */
const from = (n: number) => ({ 'X-Forwarded-For': `203.0.113.${n}` });

async function newStation() {
  const res = await request(t.http).post('/api/stations').set(g.admin).send({
    galleryId: g.gallery.id, name: `Station ${Math.random().toString(36).slice(2, 7)}`, screenWidthPx: 1080, screenHeightPx: 1920, orientation: 'portrait', mountingHeightMm: 1100,
  });
  expect(res.status).toBe(201);
  return res.body as { id: number };
}

const startPairing = async () => (await request(t.http).post('/api/kiosk/pair/start').set(SUITE_ADDRESS)).body as { pairingCode: string; pollToken: string; expiresAt: string };

describe('pairing', () => {
  it('shows a code, waits, and once a technician enters it hands the kiosk its device token and the venue key, once', async () => {
    const station = await newStation();
    const started = await request(t.http).post('/api/kiosk/pair/start').set(SUITE_ADDRESS);
    expect(started.status).toBe(201);
    expect(started.body.pairingCode).toMatch(new RegExp(`^[${PAIRING_ALPHABET}]{6}$`));
    expect(started.body.expiresAt).toBe(new Date(clock.now().getTime() + PAIRING_TTL_MS).toISOString());

    const waiting = await request(t.http).post('/api/kiosk/pair/complete').send({ pollToken: started.body.pollToken });
    expect(waiting.status).toBe(202);
    expect(waiting.body).toEqual({ status: 'waiting' });

    // Typed as a person reads it off the screen: lower case, split in two.
    const typed = `${started.body.pairingCode.slice(0, 3)}-${started.body.pairingCode.slice(3)}`.toLowerCase();
    const paired = await request(t.http).post(`/api/stations/${station.id}/pair`).set(g.technician.auth).send({ pairingCode: typed });
    expect(paired.status).toBe(201);
    expect(paired.body).toEqual({ kioskId: expect.any(Number) });

    const done = await request(t.http).post('/api/kiosk/pair/complete').send({ pollToken: started.body.pollToken });
    const key = (await request(t.http).get(`/api/venues/${g.venue.id}/signing-key`).set(g.technician.auth)).body.publicKey;
    expect(done.status).toBe(200);
    expect(done.body).toEqual({ deviceToken: expect.stringMatching(/^mpk_[A-Za-z0-9_-]{43}$/), kioskId: paired.body.kioskId, galleryId: g.gallery.id, stationId: station.id, publicKey: key });
    expect((await request(t.http).post('/api/kiosk/pair/complete').send({ pollToken: started.body.pollToken })).status).toBe(410);
  });

  it('lets a code expire after ten minutes: the kiosk is told 410 and the technician’s entry is refused', async () => {
    const station = await newStation();
    const started = await startPairing();
    clock.advance(PAIRING_TTL_MS);
    expect((await request(t.http).post('/api/kiosk/pair/complete').send({ pollToken: started.pollToken })).status).toBe(410);
    const late = await request(t.http).post(`/api/stations/${station.id}/pair`).set(g.technician.auth).set(from(1)).send({ pairingCode: started.pairingCode });
    expect(late.status).toBe(422);
    expect(late.body.errors).toEqual([{ path: ['pairingCode'], message: expect.stringMatching(/No kiosk is showing this code/) }]);
  });

  it(`throttles guessing: after ${PAIRING_MAX_FAILURES_PER_STATION} wrong codes at a station even the right one gets 429`, async () => {
    const station = await newStation();
    const started = await startPairing();
    for (let i = 0; i < PAIRING_MAX_FAILURES_PER_STATION; i += 1) {
      const wrong = await request(t.http).post(`/api/stations/${station.id}/pair`).set(g.technician.auth).set(from(2)).send({ pairingCode: '222222' });
      expect(wrong.status).toBe(422);
    }
    const right = await request(t.http).post(`/api/stations/${station.id}/pair`).set(g.technician.auth).set(from(3)).send({ pairingCode: started.pairingCode });
    expect(right.status).toBe(429);
    expect(right.body.message).toMatch(/Too many wrong pairing codes/);
  });

  it(`throttles one address after ${PAIRING_MAX_FAILURES_PER_ADDRESS} wrong codes across stations`, async () => {
    const stations = await Promise.all(Array.from({ length: Math.ceil(PAIRING_MAX_FAILURES_PER_ADDRESS / (PAIRING_MAX_FAILURES_PER_STATION - 1)) }, newStation));
    let failures = 0;
    for (const station of stations) {
      for (let i = 0; i < PAIRING_MAX_FAILURES_PER_STATION - 1 && failures < PAIRING_MAX_FAILURES_PER_ADDRESS; i += 1, failures += 1) {
        await request(t.http).post(`/api/stations/${station.id}/pair`).set(g.technician.auth).set(from(4)).send({ pairingCode: '333333' });
      }
    }
    const fresh = await newStation();
    const started = await startPairing();
    expect((await request(t.http).post(`/api/stations/${fresh.id}/pair`).set(g.technician.auth).set(from(4)).send({ pairingCode: started.pairingCode })).status).toBe(429);
    expect((await request(t.http).post(`/api/stations/${fresh.id}/pair`).set(g.technician.auth).set(from(5)).send({ pairingCode: started.pairingCode })).status).toBe(201);
  });
});

describe('a device token', () => {
  it('reaches no staff route: every one answers 403', async () => {
    const { device } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    const staffRoutes = Object.entries(ROLE_MATRIX).filter(([, access]) => access !== 'public' && access !== 'kiosk').map(([route]) => route);
    const outcomes = await Promise.all(staffRoutes.map(async (route) => {
      const [method, routePath] = route.split(' ') as [string, string];
      const res = await request(t.http)[method.toLowerCase() as 'get'](routePath.replace(/:\w+/g, '1')).set(device).send({});
      return [route, res.status];
    }));
    expect(outcomes.filter(([, status]) => status !== 403)).toEqual([]);
  });

  it('is refused at once when its kiosk is revoked, and a technician sees the kiosk revoked', async () => {
    const { device, credential } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    expect((await request(t.http).post('/api/kiosk/heartbeat').set(device).send({ releaseId: null, appVersion: '0.1.0', uptimeS: 5, storageUsedBytes: null, lastError: null })).status).toBe(204);
    const revoked = await request(t.http).post(`/api/kiosks/${credential.kioskId}/revoke`).set(g.technician.auth);
    expect(revoked.status).toBe(200);
    expect(revoked.body.revokedAt).toBe(clock.now().toISOString());
    const after = await request(t.http).post('/api/kiosk/heartbeat').set(device).send({ releaseId: null, appVersion: '0.1.0', uptimeS: 6, storageUsedBytes: null, lastError: null });
    expect(after.status).toBe(401);
  });

  it('is refused at the next poll once revoked, also among many polls read together, while another kiosk’s polls are answered', async () => {
    const kept = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    const ended = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    const pollAll = () => Promise.all(Array.from({ length: 12 }, (_, i) => request(t.http).get('/api/kiosk/manifest').set(i % 2 ? ended.device : kept.device)));
    expect((await pollAll()).map((res) => res.status)).toEqual(Array(12).fill(204));
    expect((await request(t.http).post(`/api/kiosks/${ended.credential.kioskId}/revoke`).set(g.technician.auth)).status).toBe(200);
    const after = await pollAll();
    expect(after.map((res) => res.status)).toEqual(Array.from({ length: 12 }, (_, i) => (i % 2 ? 401 : 204)));
    expect(after[1]!.body.message).toBe('Pair this kiosk to continue.');
    // The poll answered before Nest carries the security headers every API answer does (our policy; no outside source).
    const health = await request(t.http).get('/api/health');
    const security = (res: request.Response) => Object.keys(res.headers).filter((name) => /^(content-security|permissions|cross-origin|referrer|x-)/.test(name)).sort();
    expect(security(after[0]!)).toEqual(security(health));
    expect(security(after[0]!).length).toBeGreaterThan(5);
  });

  it('is refused on kiosk routes when it is a person’s access token instead', async () => {
    const res = await request(t.http).get('/api/kiosk/manifest').set(g.technician.auth);
    expect(res.status).toBe(403);
  });
});

describe('kiosk releases', () => {
  it('serves the Live manifest with an ETag, 304 while unchanged, and the new one after a publish', async () => {
    const { device } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    // Nothing published yet is a state the kiosk polls through, not an error (no 404 in its console).
    const none = await request(t.http).get('/api/kiosk/manifest').set(device);
    expect([none.status, none.text]).toEqual([204, '']);
    const first = await buildRelease(t, g.technician.auth, g.gallery.id);
    await publish(t, g.technician.auth, first.id);

    const live = await request(t.http).get('/api/kiosk/manifest').set(device);
    expect(live.status).toBe(200);
    const manifest = parseManifest(live.body.manifest);
    expect(manifest.ok && manifest.manifest.releaseId).toBe(first.id);
    // Tagged by the publication record, which names the manifest's hash: either changing changes the tag.
    expect(live.headers.etag).toBe(`"${sha256Of(Buffer.from(live.body.publication.record, 'utf8'))}"`);
    const again = await request(t.http).get('/api/kiosk/manifest').set(device).set('If-None-Match', live.headers.etag!);
    expect(again.status).toBe(304);
    expect(again.text).toBe('');

    const second = await buildRelease(t, g.technician.auth, g.gallery.id);
    await publish(t, g.technician.auth, second.id);
    const changed = await request(t.http).get('/api/kiosk/manifest').set(device).set('If-None-Match', live.headers.etag!);
    expect(changed.status).toBe(200);
    expect(changed.headers.etag).not.toBe(live.headers.etag);
  });

  it('serves each listed file immutable, in byte ranges too, and nothing of another gallery', async () => {
    const { device } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    const release = await buildRelease(t, g.technician.auth, g.gallery.id);
    await publish(t, g.technician.auth, release.id);
    const parsed = parseManifest((await request(t.http).get('/api/kiosk/manifest').set(device)).body.manifest);
    if (!parsed.ok) throw new Error(parsed.message);
    for (const file of parsed.manifest.files) {
      const res = await request(t.http).get(`/api/kiosk/files/${file.sha256}`).set(device).buffer(true).parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c)).on('end', () => done(null, Buffer.concat(chunks)));
      });
      expect(res.status).toBe(200);
      expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
      expect({ sha256: sha256Of(res.body as Buffer), size: (res.body as Buffer).length }).toEqual({ sha256: file.sha256, size: file.size });
    }
    const [file] = parsed.manifest.files;
    const part = await request(t.http).get(`/api/kiosk/files/${file!.sha256}`).set(device).set('Range', 'bytes=10-19');
    expect(part.status).toBe(206);
    expect(part.headers['content-range']).toBe(`bytes 10-19/${file!.size}`);
    expect(part.headers['content-length']).toBe('10');

    const other = await approvedGallery(t, 'kiosks-other');
    const { device: elsewhere } = await pairedKiosk(t, other.admin, other.technician.auth, other.gallery.id);
    expect((await request(t.http).get(`/api/kiosk/files/${file!.sha256}`).set(elsewhere)).status).toBe(404);
  });
});

describe('heartbeats, events and the fleet list', () => {
  it('stores a heartbeat on the kiosk and in its history, and lists the kiosk with the release it plays and the Live one', async () => {
    const { device, credential, station } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    const release = await buildRelease(t, g.technician.auth, g.gallery.id);
    await publish(t, g.technician.auth, release.id);
    const beat = { releaseId: release.id, appVersion: '0.1.0', uptimeS: 3600, storageUsedBytes: 52_428_800, lastError: 'Release 7: a file did not match its SHA-256' };
    expect((await request(t.http).post('/api/kiosk/heartbeat').set(device).send(beat)).status).toBe(204);
    expect(await t.app.get<typeof KioskHeartbeat>(getModelToken(KioskHeartbeat)).count({ where: { kioskId: credential.kioskId } })).toBe(1);

    const list = await request(t.http).get(`/api/kiosks?galleryId=${g.gallery.id}&pageSize=100`).set(g.technician.auth);
    expect(list.status).toBe(200);
    expect(list.body.items.find((k: { id: number }) => k.id === credential.kioskId)).toMatchObject({
      id: credential.kioskId, station: { id: station.id, name: station.name }, gallery: { id: g.gallery.id, name: g.gallery.name },
      pairedAt: expect.any(String), revokedAt: null, lastHeartbeatAt: clock.now().toISOString(), appVersion: '0.1.0', uptimeS: 3600,
      storageUsedBytes: 52_428_800, lastError: beat.lastError,
      releasePlaying: { id: release.id, number: release.number }, releaseLive: { id: release.id, number: release.number },
    });
    expect((await request(t.http).get('/api/kiosks').set(g.curator.auth)).status).toBe(403);
  });

  it('stores each event once however often it is uploaded, and refuses fields it does not know', async () => {
    const { device, credential } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    const events = [
      { id: randomUUID(), type: 'story_opened', at: clock.now().toISOString(), storyId: g.story.storyId, locale: 'fr' },
      { id: randomUUID(), type: 'panel_viewed', at: clock.now().toISOString(), storyId: g.story.storyId, panelId: g.story.panelIds[0], dwellMs: 8200 },
      { id: randomUUID(), type: 'switch_used', at: clock.now().toISOString(), switch: 'large_text' },
    ];
    expect((await request(t.http).post('/api/kiosk/events').set(device).send({ events })).body).toEqual({ stored: 3, duplicates: 0, dropped: 0 });
    const retried = await request(t.http).post('/api/kiosk/events').set(device).send({ events: [...events, { id: randomUUID(), type: 'language_chosen', at: clock.now().toISOString(), locale: 'es' }] });
    expect(retried.status).toBe(200);
    expect(retried.body).toEqual({ stored: 1, duplicates: 3, dropped: 0 });
    expect(await t.app.get<typeof KioskEvent>(getModelToken(KioskEvent)).count({ where: { kioskId: credential.kioskId } })).toBe(4);

    const personal = await request(t.http).post('/api/kiosk/events').set(device).send({ events: [{ ...events[0], id: randomUUID(), visitorName: 'Lucía' }] });
    expect(personal.status).toBe(400);
    expect(personal.body.errors).toEqual([{ path: ['events', 0, 'visitorName'], message: expect.any(String) }]);
  });
});
