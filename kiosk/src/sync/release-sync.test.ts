import { beforeEach, describe, expect, it } from 'vitest';
import { KioskApi } from '../app/kiosk-api';
import type { KioskStore } from '../storage/kiosk-store';
import { FakeKioskServer } from '../test-support/fake-server';
import { fixtureCredential, fixtureRelease, published, sha256Of, venueKey } from '../test-support/release-fixture';
import { testStore } from '../test-support/test-store';
import { CHUNK_BYTES } from './file-download';
import { bootRelease } from './playable-release';
import { promotePendingRelease, REFUSAL_RETRY, syncRelease } from './release-sync';

const key = venueKey();
const credential = fixtureCredential(key);

let server: FakeKioskServer;
let api: KioskApi;
let store: KioskStore;

beforeEach(async () => {
  server = new FakeKioskServer();
  api = new KioskApi(server.fetch);
  api.useDeviceToken(credential.deviceToken);
  store = await testStore();
});

async function playRelease(releaseId: number, options = {}) {
  server.live = fixtureRelease(key, releaseId, options);
  expect(await syncRelease(api, store, credential)).toEqual({ kind: 'ready', releaseId });
  expect(await promotePendingRelease(store)).toBe(releaseId);
}

describe('release sync', () => {
  it('downloads every file, checks it, and holds the release until the attract loop asks for it', async () => {
    server.live = fixtureRelease(key, 1);
    expect(await syncRelease(api, store, credential)).toEqual({ kind: 'ready', releaseId: 1 });
    expect(await store.meta('pending')).toBe(1);
    expect(await store.meta('current')).toBeNull();
    expect(await store.fileHashes()).toEqual(new Set(server.live.files.keys()));
    expect(server.requestsTo('/api/kiosk/manifest')[0]!.headers.get('Authorization')).toBe('Bearer device-token-1');
  });

  it('asks with If-None-Match and does nothing on 304', async () => {
    await playRelease(1);
    const before = server.requests.length;
    expect(await syncRelease(api, store, credential)).toEqual({ kind: 'unchanged' });
    expect(server.requests.slice(before).map((request) => request.path)).toEqual(['/api/kiosk/manifest']);
    expect(server.requests.at(-1)!.headers.get('If-None-Match')).toBe(server.live!.etag);
  });

  it('refuses a file whose hash does not match, keeps the current release and remembers why', async () => {
    await playRelease(1);
    server.live = fixtureRelease(key, 2, { imageSeed: 9 });
    const bad = server.live.manifest.files[1]!.sha256;
    server.tampered.add(bad);
    const outcome = await syncRelease(api, store, credential);
    expect(outcome.kind).toBe('rejected');
    expect(await store.meta('lastError')).toMatch(new RegExp(`^Release 2 refused: File ${bad} came as 700000 bytes hashing to [0-9a-f]{64}, not`));
    expect(await store.meta('current')).toBe(1);
    expect(await store.meta('pending')).toBeNull();
    expect((await store.fileHashes()).has(bad)).toBe(false);
    expect((await bootRelease(store, credential.publicKey))?.releaseId).toBe(1);
  });

  it('backs off after a file fails its hash: no download of the same manifest, even re-signed, until the retry time, which then doubles', async () => {
    await playRelease(1);
    server.live = fixtureRelease(key, 2, { imageSeed: 9 });
    server.tampered.add(server.live.manifest.files[1]!.sha256);
    const refusedAt = new Date('2030-01-01T12:00:00.000Z');
    const at = (ms: number) => () => new Date(refusedAt.getTime() + ms);
    const fileRequests = () => server.requests.filter((request) => request.path.startsWith('/api/kiosk/files/')).length;
    expect((await syncRelease(api, store, credential, at(0))).kind).toBe('rejected');
    const firstRetryAt = new Date(refusedAt.getTime() + REFUSAL_RETRY.firstMs).toISOString();
    expect(await store.meta('lastError')).toMatch(new RegExp(`Not downloaded again before ${firstRetryAt} unless the release changes\\.$`));
    const downloaded = fileRequests();

    expect(await syncRelease(api, store, credential, at(60_000))).toEqual({ kind: 'backing-off', releaseId: 2, retryAt: firstRetryAt });
    expect(server.requests.at(-1)!.headers.get('If-None-Match')).toBe(server.live.etag);
    // The server re-signs the same publication (a new ETag, the same manifest): still nothing downloaded.
    server.live = published(key, server.live, { sequence: 2, expiresAt: '2099-02-01T00:00:00.000Z' });
    expect(await syncRelease(api, store, credential, at(120_000))).toEqual({ kind: 'backing-off', releaseId: 2, retryAt: firstRetryAt });
    expect(await syncRelease(api, store, credential, at(180_000))).toEqual({ kind: 'backing-off', releaseId: 2, retryAt: firstRetryAt });
    expect(fileRequests()).toBe(downloaded);

    // Past the retry time it is tried once more, and refused again for twice as long.
    expect((await syncRelease(api, store, credential, at(REFUSAL_RETRY.firstMs))).kind).toBe('rejected');
    expect(fileRequests()).toBeGreaterThan(downloaded);
    expect(await store.meta('refusal')).toMatchObject({ attempts: 2, retryAt: new Date(refusedAt.getTime() + 3 * REFUSAL_RETRY.firstMs).toISOString() });
    expect(await store.meta('current')).toBe(1);
  });

  it('downloads at once when the manifest changes after a refusal, and forgets the refusal once a release checks', async () => {
    await playRelease(1);
    server.live = fixtureRelease(key, 2, { imageSeed: 9 });
    server.tampered.add(server.live.manifest.files[1]!.sha256);
    expect((await syncRelease(api, store, credential)).kind).toBe('rejected');
    server.live = fixtureRelease(key, 3, { imageSeed: 10 });
    expect(await syncRelease(api, store, credential)).toEqual({ kind: 'ready', releaseId: 3 });
    expect(await store.meta('refusal')).toBeNull();
    expect(await store.meta('lastError')).toBeNull();
  });

  it('refuses a manifest whose signature does not verify', async () => {
    await playRelease(1);
    const release = fixtureRelease(key, 2);
    server.live = { ...release, response: { ...release.response, manifest: release.response.manifest.replace('"number":2', '"number":20') } };
    const before = server.requests.length;
    expect(await syncRelease(api, store, credential)).toEqual({ kind: 'rejected', reason: 'The release manifest is not signed by this venue’s key.' });
    expect(await store.meta('current')).toBe(1);
    expect(server.requests.slice(before).some((request) => request.path.startsWith('/api/kiosk/files/'))).toBe(false);
  });

  it('refuses a release signed by another venue', async () => {
    server.live = fixtureRelease(venueKey(), 1);
    expect((await syncRelease(api, store, credential)).kind).toBe('rejected');
  });

  it('resumes a broken download with a Range request from the bytes it kept', async () => {
    server.live = fixtureRelease(key, 1);
    const large = server.live.manifest.files.find((file) => file.size === 700_000)!;
    server.cutAfter.set(large.sha256, 2 * CHUNK_BYTES + 1000);
    await expect(syncRelease(api, store, credential)).rejects.toThrow('network error');
    const kept = (await store.chunks(large.sha256)).reduce((sum, chunk) => sum + chunk.bytes.byteLength, 0);
    expect(kept).toBe(2 * CHUNK_BYTES + 1000);

    expect(await syncRelease(api, store, credential)).toEqual({ kind: 'ready', releaseId: 1 });
    const fileRequests = server.requestsTo(`/api/kiosk/files/${large.sha256}`);
    expect(fileRequests.map((request) => request.headers.get('Range'))).toEqual([null, `bytes=${kept}-`]);
    expect(await store.chunks(large.sha256)).toEqual([]);
    expect(sha256Of(new Uint8Array((await store.file(large.sha256))!.bytes))).toBe(large.sha256);
  });

  it('downloads only the files a new release does not share with the one playing', async () => {
    await playRelease(1);
    server.live = fixtureRelease(key, 2, { storyTitle: 'Plates move' });
    const before = server.requests.length;
    expect(await syncRelease(api, store, credential)).toEqual({ kind: 'ready', releaseId: 2 });
    expect(server.requests.slice(before).filter((request) => request.path.startsWith('/api/kiosk/files/'))).toEqual([]);
  });

  it('follows a technician’s rollback, a new publication of the release it replaced, with no download', async () => {
    await playRelease(1);
    const first = server.live!;
    await playRelease(2, { imageSeed: 5 });
    expect(await store.meta('previous')).toBe(1);
    server.live = published(key, first, { sequence: 3 });
    const before = server.requests.length;
    expect(await syncRelease(api, store, credential)).toEqual({ kind: 'known', releaseId: 1 });
    expect(server.requests.slice(before).filter((request) => request.path.startsWith('/api/kiosk/files/'))).toEqual([]);
    expect(await promotePendingRelease(store)).toBe(1);
    expect(await store.meta('previous')).toBe(2);
    expect(await store.meta('publication')).toEqual({ sequence: 3, releaseId: 1, expiresAt: '2099-01-01T00:00:00.000Z' });
  });

  it('refuses an older signed answer sent again, keeps playing what it plays and says why', async () => {
    await playRelease(1);
    const first = server.live!;
    await playRelease(2, { imageSeed: 5 });
    // Correctly signed by the venue, but publication 1: withdrawn by publication 2.
    server.live = first;
    const before = server.requests.length;
    const reason = 'Publication 1 is older than publication 2, which this kiosk already follows: an old answer sent again is refused.';
    expect(await syncRelease(api, store, credential)).toEqual({ kind: 'rejected', reason });
    expect(server.requests.slice(before).some((request) => request.path.startsWith('/api/kiosk/files/'))).toBe(false);
    expect(await store.meta('lastError')).toBe(reason);
    expect({ current: await store.meta('current'), pending: await store.meta('pending') }).toEqual({ current: 2, pending: null });
    expect((await store.meta('publication'))?.sequence).toBe(2);
    // A restart changes nothing: the sequence is kept with the releases.
    expect((await bootRelease(store, credential.publicKey))?.releaseId).toBe(2);
    expect((await syncRelease(api, store, credential)).kind).toBe('rejected');
  });

  it('refuses an answer whose publication record vouches for another manifest', async () => {
    await playRelease(1);
    const second = fixtureRelease(key, 2, { imageSeed: 5 });
    server.live = { ...second, response: { ...second.response, publication: fixtureRelease(key, 3).response.publication } };
    expect(await syncRelease(api, store, credential)).toEqual({ kind: 'rejected', reason: 'Publication 3 vouches for another manifest than the one sent with it.' });
    expect(await store.meta('pending')).toBeNull();
  });

  it('takes a re-signed record of the publication it plays, keeping its later expiry', async () => {
    await playRelease(1, { expiresAt: '2025-06-01T00:00:00.000Z' });
    server.live = published(key, server.live!, { sequence: 1, expiresAt: '2025-07-01T00:00:00.000Z' });
    expect(await syncRelease(api, store, credential)).toEqual({ kind: 'known', releaseId: 1 });
    expect(await store.meta('publication')).toEqual({ sequence: 1, releaseId: 1, expiresAt: '2025-07-01T00:00:00.000Z' });
    // An earlier copy of that same publication is no step back, and leaves the later expiry.
    server.live = published(key, server.live!, { sequence: 1, expiresAt: '2025-06-01T00:00:00.000Z' });
    expect(await syncRelease(api, store, credential)).toEqual({ kind: 'known', releaseId: 1 });
    expect((await store.meta('publication'))?.expiresAt).toBe('2025-07-01T00:00:00.000Z');
  });

  it('still plays a release whose publication has expired', async () => {
    server.live = fixtureRelease(key, 1, { expiresAt: '2025-06-01T00:00:00.000Z' });
    expect(await syncRelease(api, store, credential, () => new Date('2025-09-01T00:00:00.000Z'))).toEqual({ kind: 'ready', releaseId: 1 });
    expect(await promotePendingRelease(store)).toBe(1);
    expect((await bootRelease(store, credential.publicKey))?.releaseId).toBe(1);
  });

  it('drops files no kept release lists once a third release is played', async () => {
    await playRelease(1);
    const firstFiles = [...server.live!.files.keys()];
    await playRelease(2, { imageSeed: 5 });
    await playRelease(3, { imageSeed: 6 });
    const stored = await store.fileHashes();
    expect(firstFiles.filter((sha256) => stored.has(sha256))).toEqual([]);
    expect(await store.release(1)).toBeUndefined();
    expect(stored.size).toBe(4);
  });
});

describe('boot', () => {
  it('boots into the last good release from storage when the server cannot be reached', async () => {
    await playRelease(1);
    server.reachable = false;
    await expect(syncRelease(api, store, credential)).rejects.toThrow('could not reach the server');
    const release = await bootRelease(store, credential.publicKey);
    expect(release?.releaseId).toBe(1);
    expect(release?.manifest.stories.map((story) => story.title.en)).toEqual(['Why rock slides', 'Mantle overturn (en)']);
    expect(release?.imageUrls.get('m1')).toMatch(/^blob:/);
  });

  it('switches at boot to a release that became ready while the kiosk was off', async () => {
    await playRelease(1);
    server.live = fixtureRelease(key, 2, { imageSeed: 4 });
    await syncRelease(api, store, credential);
    expect((await bootRelease(store, credential.publicKey))?.releaseId).toBe(2);
  });

  it('has nothing to play before its first release', async () => {
    expect(await bootRelease(store, credential.publicKey)).toBeNull();
  });
});
