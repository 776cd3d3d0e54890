import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { KioskApi } from '../app/kiosk-api';
import { FakeKioskServer } from '../test-support/fake-server';
import { testStore } from '../test-support/test-store';
import { pairKiosk, type PairingStatus } from './pairing';

const credential = { deviceToken: 'device-token-1', kioskId: 3, galleryId: 2, stationId: 5, publicKey: 'MCowBQYDK2VwAyEA' };
const code = (pairingCode: string, expiresInMs: number) => ({ pairingCode, pollToken: `poll-${pairingCode}`, expiresAt: new Date(Date.now() + expiresInMs).toISOString() });

beforeEach(() => {
  vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout', 'Date'] });
});
afterEach(() => {
  vi.useRealTimers();
});

describe('pairing', () => {
  it('shows a code, polls with a growing interval until the technician enters it, and keeps the credential', async () => {
    const server = new FakeKioskServer();
    server.pairing.start.push(code('K7P4QX', 600_000));
    server.pairing.completes.push({ status: 202, body: { status: 'waiting' } }, { status: 202, body: { status: 'waiting' } }, { status: 200, body: credential });
    const store = await testStore();
    const statuses: PairingStatus[] = [];
    const paired = pairKiosk(new KioskApi(server.fetch), store, (status) => statuses.push(status), new AbortController().signal);

    await vi.advanceTimersByTimeAsync(2_000);
    expect(server.requestsTo('/api/kiosk/pair/complete')).toHaveLength(1);
    await vi.advanceTimersByTimeAsync(2_999);
    expect(server.requestsTo('/api/kiosk/pair/complete')).toHaveLength(1);
    await vi.advanceTimersByTimeAsync(1 + 4_500);
    expect(await paired).toEqual(credential);
    expect(statuses).toEqual([{ kind: 'code', code: expect.objectContaining({ pairingCode: 'K7P4QX' }) }]);
    expect(server.requestsTo('/api/kiosk/pair/complete').map((request) => request.body)).toEqual(Array(3).fill({ pollToken: 'poll-K7P4QX' }));
    expect(await store.credential()).toEqual(credential);
  });

  it('takes a new code when the old one expires', async () => {
    const server = new FakeKioskServer();
    server.pairing.start.push(code('AAAAAA', 60_000), code('BBBBBB', 600_000));
    server.pairing.completes.push({ status: 202, body: { status: 'waiting' } }, { status: 410, body: { statusCode: 410, message: 'Expired' } }, { status: 200, body: credential });
    const statuses: string[] = [];
    const paired = pairKiosk(new KioskApi(server.fetch), await testStore(), (status) => statuses.push(status.kind === 'code' ? status.code.pairingCode : status.kind), new AbortController().signal);
    await vi.advanceTimersByTimeAsync(2_000 + 3_000 + 2_000);
    expect(await paired).toEqual(credential);
    expect(statuses).toEqual(['AAAAAA', 'BBBBBB']);
  });

  it('says the server is away and tries again later', async () => {
    const server = new FakeKioskServer();
    server.reachable = false;
    const statuses: string[] = [];
    const controller = new AbortController();
    const paired = pairKiosk(new KioskApi(server.fetch), await testStore(), (status) => statuses.push(status.kind), controller.signal);
    paired.catch(() => undefined);
    await vi.advanceTimersByTimeAsync(5_000);
    expect(server.requestsTo('/api/kiosk/pair/start')).toHaveLength(2);
    expect(statuses).toEqual(['unreachable', 'unreachable']);
    controller.abort(new Error('screen closed'));
    await expect(paired).rejects.toThrow('screen closed');
  });
});
