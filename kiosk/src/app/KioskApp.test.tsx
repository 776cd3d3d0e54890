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
});
