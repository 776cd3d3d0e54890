import { describe, expect, it, vi } from 'vitest';
import { FakeKioskServer } from '../test-support/fake-server';
import { fixtureCredential, fixtureRelease, sha256Of, venueKey } from '../test-support/release-fixture';
import { KioskApi, KioskApiError } from './kiosk-api';

const credential = fixtureCredential(venueKey());
const pairingCode = { pairingCode: 'K7P4QX', pollToken: 'poll-K7P4QX', expiresAt: '2099-01-01T00:00:00.000Z' };

describe('KioskApi', () => {
  it('sends the device token on every route but pairing, and asks past the browser cache every time', async () => {
    const server = new FakeKioskServer();
    server.pairing.start.push(pairingCode);
    const api = new KioskApi(server.fetch);
    api.useDeviceToken(credential.deviceToken);

    await api.startPairing();
    await api.completePairing(pairingCode.pollToken);
    await api.manifest(null);
    await api.heartbeat({ releaseId: null, appVersion: '0.1.0', uptimeS: 1, storageUsedBytes: null, lastError: null });

    // Bearer tokens travel in the Authorization header: RFC 6750 §2.1. "no-store" is the Fetch
    // standard's request cache mode that neither reads nor writes the HTTP cache.
    expect(server.requests.map(({ method, path, headers, cache }) => ({ method, path, token: headers.get('Authorization'), cache }))).toEqual([
      { method: 'POST', path: '/api/kiosk/pair/start', token: null, cache: 'no-store' },
      { method: 'POST', path: '/api/kiosk/pair/complete', token: null, cache: 'no-store' },
      { method: 'GET', path: '/api/kiosk/manifest', token: `Bearer ${credential.deviceToken}`, cache: 'no-store' },
      { method: 'POST', path: '/api/kiosk/heartbeat', token: `Bearer ${credential.deviceToken}`, cache: 'no-store' },
    ]);
    expect(server.requestsTo('/api/kiosk/pair/complete')[0]!.headers.get('Content-Type')).toBe('application/json');
  });

  it('reads 204 as nothing published and 304 to If-None-Match as unchanged', async () => {
    const server = new FakeKioskServer();
    const api = new KioskApi(server.fetch);
    expect(await api.manifest(null)).toEqual({ status: 'none' });

    server.live = fixtureRelease(venueKey(), 4);
    const answer = await api.manifest(null);
    expect(answer).toEqual({ status: 'release', body: server.live.response, etag: server.live.etag });
    // A conditional GET whose entity tag still matches answers 304 Not Modified: RFC 9110 §13.1.2, §15.4.5.
    expect(await api.manifest(server.live.etag)).toEqual({ status: 'unchanged' });
    expect(server.requests.at(-1)!.headers.get('If-None-Match')).toBe(server.live.etag);
  });

  it('asks for the rest of a file with a Range header and hands its body over unread', async () => {
    const server = new FakeKioskServer();
    server.live = fixtureRelease(venueKey(), 4);
    const [sha256, bytes] = [...server.live.files][0]!;
    const api = new KioskApi(server.fetch);

    const rest = await api.file(sha256, 10);
    // A satisfied byte range answers 206 Partial Content: RFC 9110 §14.2, §15.3.7.
    expect(server.requests.at(-1)!.headers.get('Range')).toBe('bytes=10-');
    expect(rest.status).toBe(206);
    expect(sha256Of(new Uint8Array(await rest.arrayBuffer()))).toBe(sha256Of(bytes.subarray(10)));
  });

  it('tells its listener when the device token is refused, and names status 0 when the server cannot be reached', async () => {
    const server = new FakeKioskServer();
    server.revoked = true;
    const api = new KioskApi(server.fetch);
    api.useDeviceToken(credential.deviceToken);
    const unpaired = vi.fn();
    api.whenUnpaired(unpaired);

    await expect(api.manifest(null)).rejects.toMatchObject({ status: 401 });
    expect(unpaired).toHaveBeenCalledOnce();

    server.reachable = false;
    const refusal = await api.venue().catch((error: unknown) => error);
    expect(refusal).toBeInstanceOf(KioskApiError);
    expect(refusal).toMatchObject({ status: 0 });
  });
});
