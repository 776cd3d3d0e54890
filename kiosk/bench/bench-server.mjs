// The server the kiosk bench measures against: MANTLEPIECE_URL when it is set (a stack started
// with `npm start` or by `npm test`), otherwise a private stack of our own on free ports, started
// with the same helpers as `npm start` and stopped when the bench ends.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { freePort } from '../../scripts/lib/ports.mjs';
import { startStack } from '../../scripts/lib/stack.mjs';

const DEMO_GALLERY = 'Moving Plates Hall';
const DEMO_STATION = 'Rift Table';
const POLL_MS = 250;

export async function benchServer() {
  const demoPassword = process.env.DEMO_PASSWORD ?? 'mantlepiece-demo';
  if (process.env.MANTLEPIECE_URL) {
    return { url: process.env.MANTLEPIECE_URL.replace(/\/$/, ''), demoPassword, started: false, env: null, stop: async () => undefined };
  }
  const dataDir = mkdtempSync(join(tmpdir(), 'mantlepiece-kiosk-bench-'));
  const stack = await startStack({ dataDir, dbPort: await freePort(), smtpPort: await freePort(), port: await freePort(), demoPassword });
  return {
    url: stack.url,
    demoPassword,
    started: true,
    /** The server's environment, for a second instance on the same database and data folder. */
    env: stack.env,
    stop: async () => {
      await stack.stop();
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

async function call(url, path, { token, method = 'GET', body } = {}) {
  const response = await fetch(`${url}/api${path}`, {
    method,
    headers: { ...(token ? { Authorization: `Bearer ${token}` } : {}), ...(body ? { 'Content-Type': 'application/json' } : {}) },
    body: body ? JSON.stringify(body) : undefined,
  });
  const text = await response.text();
  if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}: ${text}`);
  return { status: response.status, body: text ? JSON.parse(text) : undefined };
}

const settle = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

/** The technician's view of the demo: the gallery, its station and a Live release (built and published if there is none). */
export async function demoGallery(url, demoPassword) {
  const { body: session } = await call(url, '/auth/login', { method: 'POST', body: { email: 'technician@demo.test', password: demoPassword } });
  const token = session.accessToken;
  const gallery = (await call(url, '/galleries?page=1&pageSize=100', { token })).body.items.find((item) => item.name === DEMO_GALLERY);
  const station = (await call(url, `/stations?page=1&pageSize=100&galleryId=${gallery.id}`, { token })).body.items.find((item) => item.name === DEMO_STATION);
  const recent = (await call(url, `/galleries/${gallery.id}/releases?page=1&pageSize=100`, { token })).body.items;
  let live = recent.find((release) => release.state === 'live');
  if (!live) {
    const { id } = (await call(url, `/galleries/${gallery.id}/releases`, { token, method: 'POST', body: {} })).body;
    for (;;) {
      const release = (await call(url, `/releases/${id}`, { token })).body;
      if (release.state === 'failed') throw new Error(`The demo release failed to build: ${release.failure}`);
      if (release.state === 'ready') break;
      await settle(POLL_MS);
    }
    live = (await call(url, `/releases/${id}/publish`, { token, method: 'POST' })).body;
  }
  return { token, gallery, station, live };
}

/** Pairs the station to a device the bench holds itself, for downloads outside the kiosk app. */
export async function deviceToken(url, staffToken, stationId) {
  const { body: start } = await call(url, '/kiosk/pair/start', { method: 'POST' });
  await call(url, `/stations/${stationId}/pair`, { token: staffToken, method: 'POST', body: { pairingCode: start.pairingCode } });
  const { body: credential } = await call(url, '/kiosk/pair/complete', { method: 'POST', body: { pollToken: start.pollToken } });
  return credential.deviceToken;
}

/** The Live manifest as a kiosk receives it. */
export async function liveManifest(url, device) {
  return JSON.parse((await call(url, '/kiosk/manifest', { token: device })).body.manifest);
}

export async function pairStation(url, staffToken, stationId, pairingCode) {
  await call(url, `/stations/${stationId}/pair`, { token: staffToken, method: 'POST', body: { pairingCode } });
}
