import { describe, expect, it } from 'vitest';
import { KioskApi } from '../app/kiosk-api';
import { FakeKioskServer } from '../test-support/fake-server';
import { testStore } from '../test-support/test-store';
import { EVENT_BATCH, EventOutbox } from './event-outbox';
import { heartbeatBody, sendHeartbeat } from './heartbeat';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

describe('event outbox', () => {
  it('keeps events with a random id while the server is away, then uploads them in batches, oldest first', async () => {
    const store = await testStore();
    let tick = Date.parse('2025-05-01T10:00:00Z');
    const outbox = new EventOutbox(store.db, () => new Date((tick += 1000)));
    const server = new FakeKioskServer();
    const api = new KioskApi(server.fetch);
    for (let panel = 0; panel < EVENT_BATCH + 5; panel += 1) await outbox.record({ type: 'panel_viewed', storyId: 7, panelId: panel, dwellMs: 4000, locale: 'fr' });

    server.reachable = false;
    expect(await outbox.upload(api)).toBe(0);
    expect(await outbox.waiting()).toBe(EVENT_BATCH + 5);

    server.reachable = true;
    expect(await outbox.upload(api)).toBe(EVENT_BATCH + 5);
    const batches = server.requestsTo('/api/kiosk/events').slice(1).map((request) => (request.body as { events: Array<{ id: string; panelId: number; at: string }> }).events);
    expect(batches.map((events) => events.length)).toEqual([EVENT_BATCH, 5]);
    expect(batches[0]![0]).toEqual({ id: expect.stringMatching(UUID), type: 'panel_viewed', at: '2025-05-01T10:00:01.000Z', storyId: 7, panelId: 0, dwellMs: 4000, locale: 'fr' });
    expect(new Set(batches.flat().map((event) => event.id)).size).toBe(EVENT_BATCH + 5);
    expect(await outbox.waiting()).toBe(0);
  });
});

describe('heartbeat', () => {
  it('reports the release playing, version, uptime and the last error, and shrugs off a server that is away', async () => {
    const store = await testStore();
    await store.setMeta('lastError', 'Release 2 refused: a file did not match its SHA-256.');
    const body = await heartbeatBody(store, 1, '0.1.0', 1_000, 91_400);
    expect(body).toEqual({
      releaseId: 1, appVersion: '0.1.0', uptimeS: 90, storageUsedBytes: null, lastError: 'Release 2 refused: a file did not match its SHA-256.',
      publicationSequence: null, publicationExpiresAt: null, publicationExpired: false,
    });
    const server = new FakeKioskServer();
    expect(await sendHeartbeat(new KioskApi(server.fetch), body)).toBe(true);
    expect(server.requestsTo('/api/kiosk/heartbeat')[0]!.body).toEqual(body);
    server.reachable = false;
    expect(await sendHeartbeat(new KioskApi(server.fetch), body)).toBe(false);
  });

  it('says when the publication it follows has expired by its clock, and sends its last error as plain text', async () => {
    const store = await testStore();
    await store.setMeta('publication', { sequence: 4, releaseId: 2, expiresAt: '2025-06-01T00:00:00.000Z' });
    await store.setMeta('lastError', 'The manifest does not match:\n "title"\u202E');
    const fresh = await heartbeatBody(store, 2, '0.1.0', 0, Date.parse('2025-05-31T23:59:59.999Z'));
    expect(fresh).toMatchObject({ publicationSequence: 4, publicationExpiresAt: '2025-06-01T00:00:00.000Z', publicationExpired: false, lastError: 'The manifest does not match: "title"' });
    expect((await heartbeatBody(store, 2, '0.1.0', 0, Date.parse('2025-06-01T00:00:00.000Z'))).publicationExpired).toBe(true);
  });
});
