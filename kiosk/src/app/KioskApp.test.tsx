import { act, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import './i18n';
import type { KioskStore } from '../storage/kiosk-store';
import { syncRelease, promotePendingRelease } from '../sync/release-sync';
import { FakeKioskServer } from '../test-support/fake-server';
import { fixtureCredential, fixtureRelease, venueKey } from '../test-support/release-fixture';
import { testStore } from '../test-support/test-store';
import { DEFAULT_CONFIG } from './config';
import { KioskApi } from './kiosk-api';
import { KioskApp } from './KioskApp';

const key = venueKey();
const credential = fixtureCredential(key);
const config = { ...DEFAULT_CONFIG, idleMs: 60_000, warningMs: 20_000, manifestPollMs: 30_000 };

let server: FakeKioskServer;
let store: KioskStore;

/** A kiosk that was paired and played release 1 before this boot. */
async function pairedKioskWithRelease() {
  server = new FakeKioskServer();
  store = await testStore();
  await store.saveCredential(credential);
  const api = new KioskApi(server.fetch);
  api.useDeviceToken(credential.deviceToken);
  server.live = fixtureRelease(key, 1, { storyTitle: 'Why rock slides' });
  await syncRelease(api, store, credential);
  await promotePendingRelease(store);
}

// Real waits here are only IndexedDB round trips (fake-indexeddb runs them on setImmediate).
const settle = () => act(() => vi.advanceTimersByTimeAsync(0));

beforeEach(() => {
  vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout', 'setInterval', 'clearInterval', 'Date'] });
});
afterEach(() => vi.useRealTimers());

describe('kiosk app', () => {
  it('boots into its last good release from storage when the server cannot be reached', async () => {
    await pairedKioskWithRelease();
    server.reachable = false;
    render(<KioskApp api={new KioskApi(server.fetch)} store={store} config={config} appVersion="0.1.0" />);
    await vi.waitFor(() => screen.getByText('Why rock slides'));
    fireEvent.click(screen.getByRole('button', { name: /Touch to begin/ }));
    expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('Choose a story');
  });

  it('switches to a newly synced release only once the visitor is back on the attract loop', async () => {
    await pairedKioskWithRelease();
    render(<KioskApp api={new KioskApi(server.fetch)} store={store} config={config} appVersion="0.1.0" />);
    await vi.waitFor(() => screen.getByText('Why rock slides'));
    fireEvent.click(screen.getByRole('button', { name: /Touch to begin/ }));
    fireEvent.click(screen.getByRole('button', { name: /Why rock slides/ }));

    server.live = fixtureRelease(key, 2, { storyTitle: 'Plates on the move', imageSeed: 3 });
    await act(() => vi.advanceTimersByTimeAsync(config.manifestPollMs));
    await vi.waitFor(async () => expect(await store.meta('pending')).toBe(2));
    await settle();
    expect(screen.getByRole('heading', { level: 2 }).textContent).toBe('Why rock slides 1');
    fireEvent.click(screen.getByRole('button', { name: /All stories/ }));
    expect(screen.getByRole('button', { name: /Why rock slides/ })).toBeTruthy();

    // The visitor walks away: warning, then the reset to the attract loop, where the switch happens.
    await act(() => vi.advanceTimersByTimeAsync(config.idleMs + config.warningMs));
    await vi.waitFor(() => screen.getByText('Plates on the move'));
    expect(await store.meta('current')).toBe(2);
    expect(await store.meta('previous')).toBe(1);
  });

  it('shows a pairing code when it has no credential, and plays once paired and synced', async () => {
    server = new FakeKioskServer();
    store = await testStore();
    server.pairing.start.push({ pairingCode: 'K7P4QX', pollToken: 'poll-1', expiresAt: new Date(Date.now() + 600_000).toISOString() });
    server.pairing.completes.push({ status: 200, body: credential });
    server.live = fixtureRelease(key, 1);
    render(<KioskApp api={new KioskApi(server.fetch)} store={store} config={config} appVersion="0.1.0" />);
    await vi.waitFor(() => expect(document.querySelector('[data-pairing-code]')?.getAttribute('data-pairing-code')).toBe('K7P4QX'));
    expect(screen.getByText(/enter this code there/)).toBeTruthy();
    await act(() => vi.advanceTimersByTimeAsync(2_000));
    await vi.waitFor(() => screen.getByText('Why rock slides'));
    expect(await store.credential()).toEqual(credential);
    expect(server.requestsTo('/api/kiosk/heartbeat')[0]!.body).toMatchObject({ appVersion: '0.1.0', lastError: null });
  });

  it('shows the venue its install URL names while unpaired, and its own venue once paired', async () => {
    server = new FakeKioskServer();
    store = await testStore();
    server.venues = { bySlug: { 'basalt-point': { name: 'Basalt Point Earth Science Centre', locales: ['en', 'fr'] } }, paired: { name: 'Obsidian Bay Geology Hall', locales: ['es', 'en'] } };
    server.pairing.start.push({ pairingCode: 'V3NU3A', pollToken: 'poll-v', expiresAt: new Date(Date.now() + 600_000).toISOString() });
    server.pairing.completes.push({ status: 200, body: credential });
    render(<KioskApp api={new KioskApi(server.fetch)} store={store} config={{ ...config, venueSlug: 'basalt-point' }} appVersion="0.1.0" />);
    await vi.waitFor(() => screen.getByText('Basalt Point Earth Science Centre'));
    expect(server.requestsTo('/api/kiosk/venue')[0]!.search).toBe('?slug=basalt-point');

    // Paired to a station of another venue, with nothing published yet: the waiting screen speaks that venue's languages.
    await act(() => vi.advanceTimersByTimeAsync(2_000));
    await vi.waitFor(() => expect(server.requestsTo('/api/kiosk/venue')).toHaveLength(2));
    const asked = server.requestsTo('/api/kiosk/venue')[1]!;
    expect({ search: asked.search, token: asked.headers.get('Authorization') }).toEqual({ search: '', token: `Bearer ${credential.deviceToken}` });
    await vi.waitFor(() => expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('Las historias están en camino'));
  });

  it('once revoked, lets the visitor finish, forgets its pairing and releases, and shows that it was unpaired with a new code, also after a restart', async () => {
    await pairedKioskWithRelease();
    await store.db.put('outbox', { id: 'e-1', at: new Date().toISOString(), type: 'story_opened', storyId: 1, locale: 'en' } as never);
    server.pairing.start.push(
      { pairingCode: 'R3NEW1', pollToken: 'poll-2', expiresAt: new Date(Date.now() + 600_000).toISOString() },
      { pairingCode: 'R3NEW2', pollToken: 'poll-3', expiresAt: new Date(Date.now() + 600_000).toISOString() },
    );
    const view = render(<KioskApp api={new KioskApi(server.fetch)} store={store} config={config} appVersion="0.1.0" />);
    await vi.waitFor(() => screen.getByText('Why rock slides'));
    fireEvent.click(screen.getByRole('button', { name: /Touch to begin/ }));
    fireEvent.click(screen.getByRole('button', { name: /Why rock slides/ }));

    server.revoked = true;
    await act(() => vi.advanceTimersByTimeAsync(config.manifestPollMs));
    const callsWhenRefused = server.requests.length;
    // The visitor is mid-story: it plays on, and the kiosk stops calling a server that refuses it.
    await act(() => vi.advanceTimersByTimeAsync(config.idleMs - config.manifestPollMs - 1_000));
    expect(screen.getByRole('heading', { level: 2 }).textContent).toBe('Why rock slides 1');
    expect(server.requests.slice(callsWhenRefused).filter((request) => !request.path.startsWith('/api/kiosk/pair/'))).toEqual([]);
    expect(await store.credential()).toEqual(credential);

    // The visitor walks away; at the reset the pairing is forgotten and a new code shows.
    await act(() => vi.advanceTimersByTimeAsync(config.warningMs + 1_000));
    await vi.waitFor(() => expect(document.querySelector('[data-pairing-code]')?.getAttribute('data-pairing-code')).toBe('R3NEW1'));
    expect(screen.getByText(/This screen was unpaired in the studio/)).toBeTruthy();
    expect(await store.credential()).toBeUndefined();
    expect({ releases: await store.db.count('releases'), files: await store.db.count('files'), outbox: await store.db.count('outbox'), current: await store.meta('current') })
      .toEqual({ releases: 0, files: 0, outbox: 0, current: null });

    // A restart: still unpaired, still saying so, with a code of its own.
    view.unmount();
    render(<KioskApp api={new KioskApi(server.fetch)} store={store} config={config} appVersion="0.1.0" />);
    await vi.waitFor(() => expect(document.querySelector('[data-pairing-code]')?.getAttribute('data-pairing-code')).toBe('R3NEW2'));
    expect(screen.getByText(/This screen was unpaired in the studio/)).toBeTruthy();

    // Paired anew: the notice goes for good.
    server.revoked = false;
    server.pairing.completes.push({ status: 200, body: credential });
    await act(() => vi.advanceTimersByTimeAsync(2_000));
    await vi.waitFor(() => screen.getByText('Why rock slides'));
    expect(await store.meta('unpairedAt')).toBeNull();
  });

  it('unpairs at once when it is revoked while waiting for its first release', async () => {
    server = new FakeKioskServer();
    store = await testStore();
    await store.saveCredential(credential);
    server.revoked = true;
    server.pairing.start.push({ pairingCode: 'W4ITED', pollToken: 'poll-4', expiresAt: new Date(Date.now() + 600_000).toISOString() });
    render(<KioskApp api={new KioskApi(server.fetch)} store={store} config={config} appVersion="0.1.0" />);
    await vi.waitFor(() => expect(document.querySelector('[data-pairing-code]')?.getAttribute('data-pairing-code')).toBe('W4ITED'));
    expect(await store.credential()).toBeUndefined();
  });

  it('names a release refused for a bad file on its waiting screen and in its heartbeat, and does not download it again on the next poll', async () => {
    server = new FakeKioskServer();
    store = await testStore();
    await store.saveCredential(credential);
    server.live = fixtureRelease(key, 4, { imageSeed: 8 });
    server.tampered.add(server.live.manifest.files[0]!.sha256);
    render(<KioskApp api={new KioskApi(server.fetch)} store={store} config={config} appVersion="0.1.0" />);
    await vi.waitFor(() => expect(document.querySelector('[data-refused-release]')?.getAttribute('data-refused-release')).toBe('4'));
    expect(screen.getAllByText(/Release 4 was refused: a file did not match/)).toHaveLength(1);
    const downloads = () => server.requests.filter((request) => request.path.startsWith('/api/kiosk/files/')).length;
    const before = downloads();
    await act(() => vi.advanceTimersByTimeAsync(Math.max(config.manifestPollMs * 3, config.heartbeatMs)));
    expect(downloads()).toBe(before);
    const heartbeat = server.requestsTo('/api/kiosk/heartbeat').at(-1)!.body as { lastError: string };
    expect(heartbeat.lastError).toMatch(/^Release 4 refused: File [0-9a-f]{64} came as .* Not downloaded again before \S+ unless the release changes\.$/);
  });
});
