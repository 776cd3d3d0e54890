import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FleetKioskView } from '@mantlepiece/shared';
import { approve, approvedGallery, buildRelease, pairedKiosk, publish } from '../../test/release-fixtures.js';
import { storyWithPanels, type Headers } from '../../test/review-fixtures.js';
import { createTestApp, TestClock, type TestApp } from '../../test/test-app.js';
import { KioskEvent } from './models/kiosk-event.model.js';
import { KioskHeartbeat } from './models/kiosk-heartbeat.model.js';

const mediaDir = fs.mkdtempSync(path.join(os.tmpdir(), 'mantlepiece-kiosk-reports-'));
const clock = new TestClock();
let t: TestApp;
let g: Awaited<ReturnType<typeof approvedGallery>>;
let other: Awaited<ReturnType<typeof approvedGallery>>;
let live: { id: number; number: number };
let othersRelease: { id: number };
let device: Headers;
let kioskId: number;

beforeAll(async () => {
  t = await createTestApp({ clock, env: { MEDIA_DIR: mediaDir } });
  g = await approvedGallery(t, 'kiosk-reports');
  other = await approvedGallery(t, 'kiosk-reports-other');
  live = await buildRelease(t, g.technician.auth, g.gallery.id);
  await publish(t, g.technician.auth, live.id);
  othersRelease = await buildRelease(t, other.technician.auth, other.gallery.id);
  await publish(t, other.technician.auth, othersRelease.id);
  ({ device, credential: { kioskId } } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id));
});
afterAll(async () => {
  await t.close();
  fs.rmSync(mediaDir, { recursive: true, force: true });
});

const heartbeat = (body: Record<string, unknown>) =>
  request(t.http).post('/api/kiosk/heartbeat').set(device).send({ releaseId: live.id, appVersion: '0.1.0', uptimeS: 60, storageUsedBytes: null, lastError: null, ...body });
const heartbeatsStored = () => t.app.get<typeof KioskHeartbeat>(getModelToken(KioskHeartbeat)).count({ where: { kioskId } });

describe('heartbeats', () => {
  it('refuses with 422 naming releaseId a release of another gallery, one that does not exist, and one never published', async () => {
    const unpublished = await buildRelease(t, g.technician.auth, g.gallery.id);
    const before = await heartbeatsStored();
    for (const releaseId of [othersRelease.id, 2_000_000_000, unpublished.id]) {
      const res = await heartbeat({ releaseId });
      expect(res.status, `release ${releaseId}`).toBe(422);
      expect(res.body.errors).toEqual([{ path: ['releaseId'], message: `Release ${releaseId} is not one of this gallery’s published releases.` }]);
    }
    expect(await heartbeatsStored()).toBe(before);
    expect((await heartbeat({})).status).toBe(204);
    expect((await heartbeat({ releaseId: null })).status).toBe(204);
  });

  it('stores every one of a kiosk’s heartbeats sent at once (a kiosk retrying after a dropped connection), none refused as a deadlock', async () => {
    const before = await heartbeatsStored();
    const statuses = await Promise.all(Array.from({ length: 16 }, (_, uptimeS) => heartbeat({ uptimeS }).then((res) => res.status)));
    expect(statuses).toEqual(Array.from({ length: 16 }, () => 204));
    expect(await heartbeatsStored()).toBe(before + 16);
  });

  it('keeps free text to letters, digits, punctuation, symbols and spaces, within its length: 400 naming the field otherwise', async () => {
    const before = await heartbeatsStored();
    const refused: [string, unknown][] = [
      ['lastError', 'Release 2 refused\nInjected: second line'],
      ['lastError', 'Release 2 \u202Edesufer'],
      ['lastError', '\u001b[2J cleared'],
      ['lastError', 'x'.repeat(1001)],
      ['appVersion', '0.1.0 <script>'],
      ['appVersion', ''],
    ];
    for (const [field, value] of refused) {
      const res = await heartbeat({ [field]: value });
      expect(res.status, JSON.stringify(value)).toBe(400);
      expect(res.body.errors.map((error: { path: unknown[] }) => error.path), JSON.stringify(value)).toContainEqual([field]);
    }
    expect(await heartbeatsStored()).toBe(before);
    expect((await heartbeat({ lastError: 'Publication 4 est plus ancienne que la 5 — refusée « rejouée ».', appVersion: '1.4.0-rc.1+build.7' })).status).toBe(204);
  });

  it('records the publication the kiosk follows and that it has expired, for the Fleet page', async () => {
    const expiresAt = new Date(clock.now().getTime() - 60_000).toISOString();
    expect((await heartbeat({ publicationSequence: 1, publicationExpiresAt: expiresAt, publicationExpired: true })).status).toBe(204);
    const res = await request(t.http).get(`/api/kiosks?galleryId=${g.gallery.id}&pageSize=100`).set(g.technician.auth);
    const row = (res.body.items as FleetKioskView[]).find((kiosk) => kiosk.id === kioskId);
    expect(row?.publication).toEqual({ sequence: 1, expiresAt, expired: true });
    const detail = await request(t.http).get(`/api/kiosks/${kioskId}`).set(g.technician.auth);
    expect(detail.body.heartbeats.items[0].publication).toEqual({ sequence: 1, expiresAt, expired: true });

    // A kiosk older than publication records says nothing of them.
    expect((await heartbeat({})).status).toBe(204);
    const after = await request(t.http).get(`/api/kiosks/${kioskId}`).set(g.technician.auth);
    expect(after.body.publication).toBeNull();

    for (const bad of [{ publicationSequence: 0 }, { publicationExpiresAt: '0001-01-01T00:00:00Z' }, { publicationExpired: 'yes' }]) {
      expect((await heartbeat(bad)).status, JSON.stringify(bad)).toBe(400);
    }
  });
});

describe('visitor events', () => {
  it('stores only events whose story and panel a published release of the kiosk’s gallery carries, and counts the ones it drops', async () => {
    const unreleased = await storyWithPanels(t, g.curator.auth, g.exhibit.id);
    await approve(t, g.curator.auth, g.educator.auth, unreleased.storyId);
    const at = clock.now().toISOString();
    const event = (fields: Record<string, unknown>) => ({ id: randomUUID(), type: 'panel_viewed', at, dwellMs: 5000, ...fields });
    const kept = [
      event({ storyId: g.story.storyId, panelId: g.story.panelIds[0] }),
      event({ type: 'story_opened', storyId: g.story.storyId, dwellMs: undefined }),
      event({ panelId: g.story.panelIds[0] }),
      event({ type: 'language_chosen', locale: 'fr', dwellMs: undefined }),
    ];
    const dropped = [
      // Another venue's story and panel.
      event({ storyId: other.story.storyId, panelId: other.story.panelIds[0] }),
      event({ type: 'story_opened', storyId: other.story.storyId, dwellMs: undefined }),
      // A story of this gallery that is approved but in no published release.
      event({ storyId: unreleased.storyId, panelId: unreleased.panelIds[0] }),
      // A released panel named under another story.
      event({ storyId: unreleased.storyId, panelId: g.story.panelIds[0] }),
      event({ storyId: g.story.storyId, panelId: other.story.panelIds[0] }),
      event({ storyId: 2_000_000_000 }),
    ];
    const res = await request(t.http).post('/api/kiosk/events').set(device).send({ events: [...dropped.slice(0, 3), ...kept, ...dropped.slice(3)] });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ stored: kept.length, duplicates: 0, dropped: dropped.length });
    const stored = await t.app.get<typeof KioskEvent>(getModelToken(KioskEvent)).findAll({ where: { kioskId }, attributes: ['id'] });
    expect(stored.map((row) => row.id).sort()).toEqual(kept.map((e) => e.id).sort());

    const resent = await request(t.http).post('/api/kiosk/events').set(device).send({ events: [...kept, dropped[0]] });
    expect(resent.body).toEqual({ stored: 0, duplicates: kept.length, dropped: 1 });
  });
});
