import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import type { FleetKioskDetail, FleetKioskView, Page } from '@mantlepiece/shared';
import { approvedGallery, buildRelease, pairedKiosk, publish } from '../../test/release-fixtures.js';
import { createReviewApp, type Headers } from '../../test/review-fixtures.js';

const t = await createReviewApp();
afterAll(() => t.close());

const g = await approvedGallery(t, 'fleet');
const first = await buildRelease(t, g.technician.auth, g.gallery.id);
await publish(t, g.technician.auth, first.id);

const beat = (device: Headers, body: Record<string, unknown> = {}) =>
  request(t.http).post('/api/kiosk/heartbeat').set(device).send({ releaseId: first.id, appVersion: '0.1.0', uptimeS: 120, storageUsedBytes: 4_000_000, lastError: null, ...body });

async function fleetRow(kioskId: number): Promise<FleetKioskView> {
  const res = await request(t.http).get('/api/kiosks').query({ galleryId: g.gallery.id, pageSize: 100 }).set(g.technician.auth);
  expect(res.status).toBe(200);
  const row = (res.body as Page<FleetKioskView>).items.find((kiosk) => kiosk.id === kioskId);
  if (!row) throw new Error(`expected kiosk ${kioskId} in the gallery's fleet list, got ${JSON.stringify(res.body.items.map((k: FleetKioskView) => k.id))}`);
  return row;
}

describe('fleet states', () => {
  it('moves a kiosk from online to stale at two heartbeat intervals and to offline at five minutes, and back on a heartbeat', async () => {
    const { credential, device } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    expect((await fleetRow(credential.kioskId)).state).toBe('offline');

    expect((await beat(device)).status).toBe(204);
    expect((await fleetRow(credential.kioskId)).state).toBe('online');
    t.clock.advance(59_000);
    expect((await fleetRow(credential.kioskId)).state).toBe('online');
    t.clock.advance(1_000);
    expect((await fleetRow(credential.kioskId)).state).toBe('stale');
    t.clock.advance(239_999);
    expect((await fleetRow(credential.kioskId)).state).toBe('stale');
    t.clock.advance(1);
    expect((await fleetRow(credential.kioskId)).state).toBe('offline');

    expect((await beat(device)).status).toBe(204);
    expect((await fleetRow(credential.kioskId)).state).toBe('online');
  });

  it('shows the release a kiosk plays against the live one, and its last error', async () => {
    const { credential, device } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    await beat(device);
    expect(await fleetRow(credential.kioskId)).toMatchObject({
      releasePlaying: { id: first.id, number: first.number }, releaseLive: { id: first.id, number: first.number }, playsLiveRelease: true, lastError: null,
    });

    const second = await buildRelease(t, g.technician.auth, g.gallery.id);
    await publish(t, g.technician.auth, second.id);
    await beat(device, { lastError: 'Release 2 refused: a file did not match its SHA-256.' });
    expect(await fleetRow(credential.kioskId)).toMatchObject({
      releasePlaying: { id: first.id }, releaseLive: { id: second.id, number: second.number }, playsLiveRelease: false,
      lastError: 'Release 2 refused: a file did not match its SHA-256.',
    });
  });

  it("gives a kiosk's page with its heartbeats newest first, a page at a time", async () => {
    const { credential, device } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    for (const uptimeS of [30, 60, 90]) {
      await beat(device, { uptimeS });
      t.clock.advance(30_000);
    }
    const res = await request(t.http).get(`/api/kiosks/${credential.kioskId}`).query({ page: 1, pageSize: 2 }).set(g.technician.auth);
    expect(res.status).toBe(200);
    const detail = res.body as FleetKioskDetail;
    expect(detail).toMatchObject({ id: credential.kioskId, station: { id: expect.any(Number) }, gallery: { id: g.gallery.id }, state: 'online', uptimeS: 90 });
    expect(detail.heartbeats).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    expect(detail.heartbeats.items.map((h) => h.uptimeS)).toEqual([90, 60]);
    expect(detail.heartbeats.items[0]).toEqual({
      id: expect.any(Number), receivedAt: expect.any(String), release: { id: first.id, number: first.number }, appVersion: '0.1.0', uptimeS: 90, storageUsedBytes: 4_000_000, lastError: null, publication: null,
    });
    const second = await request(t.http).get(`/api/kiosks/${credential.kioskId}`).query({ page: 2, pageSize: 2 }).set(g.technician.auth);
    expect(second.body.heartbeats.items.map((h: { uptimeS: number }) => h.uptimeS)).toEqual([30]);

    expect((await request(t.http).get('/api/kiosks/999999').set(g.technician.auth)).status).toBe(404);
  });
});

describe('revoking a kiosk', () => {
  it('ends its access at once: the next heartbeat, manifest and event upload are refused', async () => {
    const { credential, device } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    expect((await beat(device)).status).toBe(204);
    expect((await request(t.http).get('/api/kiosk/manifest').set(device)).status).toBe(200);

    const revoked = await request(t.http).post(`/api/kiosks/${credential.kioskId}/revoke`).set(g.technician.auth);
    expect(revoked.status).toBe(200);
    expect(revoked.body.revokedAt).toEqual(t.clock.now().toISOString());

    expect((await beat(device)).status).toBe(401);
    expect((await request(t.http).get('/api/kiosk/manifest').set(device)).status).toBe(401);
    expect((await request(t.http).post('/api/kiosk/events').set(device).send({ events: [] })).status).toBe(401);
    expect((await fleetRow(credential.kioskId)).revokedAt).toEqual(revoked.body.revokedAt);
  });
});

describe('the fleet by access', () => {
  it('lists active and revoked kiosks apart when asked, both when not, and refuses an unknown access with 400', async () => {
    const station = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    expect((await request(t.http).post(`/api/kiosks/${station.credential.kioskId}/revoke`).set(g.technician.auth)).status).toBe(200);
    const live = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    const ids = async (access?: string) => {
      const res = await request(t.http).get('/api/kiosks').query({ galleryId: g.gallery.id, pageSize: 100, ...(access ? { access } : {}) }).set(g.technician.auth);
      expect(res.status).toBe(200);
      return (res.body as Page<FleetKioskView>).items.map((kiosk) => kiosk.id);
    };
    const [revokedId, activeId] = [station.credential.kioskId, live.credential.kioskId];
    expect(await ids('active')).toContain(activeId);
    expect(await ids('active')).not.toContain(revokedId);
    expect(await ids('revoked')).toContain(revokedId);
    expect(await ids('revoked')).not.toContain(activeId);
    expect(await ids()).toEqual(expect.arrayContaining([activeId, revokedId]));
    const refused = await request(t.http).get('/api/kiosks').query({ access: 'paused' }).set(g.technician.auth);
    expect(refused.status).toBe(400);
    expect(refused.body.errors).toEqual([{ path: ['access'], message: 'access is one of active, revoked.' }]);
  });
});
