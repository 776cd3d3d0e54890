// Server benchmark (issue 15), not a timed test: `npm run bench -w server`. Every figure is a ratio
// against a reference measured in the same run on the same machine: the kiosk manifest poll against
// a bare node:http server answering the same bytes, the studio's list routes against /api/health.
// The machine's cores are shared by the load generator, the servers, MariaDB, the reference and
// whatever else runs, so the figures are measured in rounds: each round measures the reference and
// every route once, one after the other, and a ratio is the median over rounds of each round's own
// ratio, so that a busy moment weighs on reference and route alike.
// Needs a server: MANTLEPIECE_URL when set, else a private stack on free ports (kiosk/bench/bench-server.mjs),
// which also gets a second instance behind nginx (scripts/lib/nginx.mjs) for the venue-network figures.
import { spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import autocannon from 'autocannon';
import { benchServer, demoGallery, deviceToken } from '../../kiosk/bench/bench-server.mjs';
import { startNginx } from '../../scripts/lib/nginx.mjs';
import { freePort } from '../../scripts/lib/ports.mjs';
import { startOwned, waitFor } from '../../scripts/lib/processes.mjs';
import { root } from '../../scripts/lib/stack.mjs';

/** As the issue measured them: 16 connections on loopback; each figure after a warm-up of its own. */
const CONNECTIONS = 16;
const SECONDS = Number(process.env.BENCH_SECONDS ?? 4);
const WARM_UP_SECONDS = 1;
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 5);
const GOALS = { manifest: 0.5, notModified: 0.8 };
const NGINX_KEEPALIVE = 32;
/** The device-token recheck a venue network may allow (PAIRED_KIOSK_RECHECK_MS, README's sizing). */
const RECHECK_MS = 1000;

async function measure({ url, headers = {}, status = 200, requests }) {
  const request = { url, headers, requests, connections: CONNECTIONS };
  await autocannon({ ...request, duration: WARM_UP_SECONDS });
  const result = await autocannon({ ...request, duration: SECONDS });
  const expected = result.statusCodeStats[status]?.count ?? 0;
  const total = Object.values(result.statusCodeStats).reduce((sum, { count }) => sum + count, 0);
  if (total === 0 || expected !== total) throw new Error(`${url} answered ${JSON.stringify(result.statusCodeStats)}, not only ${status}`);
  return { perSecond: result.requests.average, p99Ms: result.latency.p99 };
}

const median = (values) => {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
};

/**
 * Measures every figure once per round, in turn; the first figure is the reference. Each figure
 * gets its median requests/s and p99 over the rounds, and its ratio to the reference per round.
 */
async function inRounds(figures) {
  const runs = figures.map(() => []);
  for (let round = 0; round < ROUNDS; round += 1) {
    for (const [index, figure] of figures.entries()) runs[index].push(await measure(figure));
  }
  const reference = runs[0];
  return figures.map((figure, index) => {
    const ratios = runs[index].map((run, round) => run.perSecond / reference[round].perSecond);
    return {
      ...figure,
      perSecond: median(runs[index].map((run) => run.perSecond)),
      p99Ms: median(runs[index].map((run) => run.p99Ms)),
      ratio: median(ratios),
      lowest: Math.min(...ratios),
      highest: Math.max(...ratios),
    };
  });
}

const row = ({ what, perSecond, p99Ms, ratio, lowest, highest, goal }) =>
  `| ${what} | ${Math.round(perSecond)} | ${p99Ms} | ${ratio.toFixed(2)} | ${lowest.toFixed(2)}–${highest.toFixed(2)} | ${goal === undefined ? '—' : `≥ ${goal} ${ratio >= goal ? 'met' : '**not met**'}`} |`;

async function bareServer(body, etag) {
  const folder = mkdtempSync(join(tmpdir(), 'mantlepiece-server-bench-'));
  const file = join(folder, 'manifest.json');
  writeFileSync(file, body);
  const child = spawn(process.execPath, [new URL('./bare-server.mjs', import.meta.url).pathname], { env: { ...process.env, BARE_BODY_FILE: file, BARE_ETAG: etag }, stdio: ['ignore', 'pipe', 'inherit'] });
  const port = await new Promise((resolve, reject) => {
    child.stdout.on('data', (chunk) => {
      const match = /listening (\d+)/.exec(chunk.toString());
      if (match) resolve(Number(match[1]));
    });
    child.once('exit', (code) => reject(new Error(`the bare server exited with ${code}`)));
  });
  return {
    url: `http://127.0.0.1:${port}/`,
    stop: async () => {
      const exited = new Promise((resolve) => child.once('exit', resolve));
      child.kill('SIGTERM');
      await exited;
      rmSync(folder, { recursive: true, force: true });
    },
  };
}

/** One more server instance on the bench server's database and data folder, with settings of its own. */
async function extraInstance(server, name, settings = {}) {
  const port = await freePort();
  const instance = startOwned(name, process.execPath, ['server/dist/main.js'], { cwd: root, env: { ...server.env, ...settings, PORT: String(port) } });
  try {
    await waitFor(async () => (await fetch(`http://127.0.0.1:${port}/api/health`)).ok, {
      what: name, timeoutMs: 90_000,
      failIf: () => (instance.child.exitCode !== null ? `${name} exited: ${instance.recentOutput().trim().split('\n').slice(-8).join('\n')}` : null),
    });
  } catch (error) {
    await instance.stop();
    throw error;
  }
  return { port, url: `http://127.0.0.1:${port}`, stop: () => instance.stop() };
}

/**
 * A second server instance and nginx round robin over both (keeping idle connections to them open,
 * as README's operations section advises), and an instance that lets a device-token read answer its
 * kiosk for PAIRED_KIOSK_RECHECK_MS; null against a server the bench did not start, whose settings it
 * does not know.
 */
async function venueNetwork(server) {
  if (!server.env) return null;
  const folder = mkdtempSync(join(tmpdir(), 'mantlepiece-bench-network-'));
  const started = [];
  let nginx;
  const stop = async () => {
    await nginx?.stop();
    for (const instance of started) await instance.stop();
    rmSync(folder, { recursive: true, force: true });
  };
  try {
    const second = await extraInstance(server, 'server-b');
    started.push(second);
    const rechecking = await extraInstance(server, 'server-recheck', { PAIRED_KIOSK_RECHECK_MS: String(RECHECK_MS) });
    started.push(rechecking);
    const nginxPort = await freePort();
    nginx = await startNginx({ dir: folder, port: nginxPort, upstreams: [Number(new URL(server.url).port), second.port], keepalive: NGINX_KEEPALIVE });
    return { url: `http://127.0.0.1:${nginxPort}`, recheckUrl: rechecking.url, stop };
  } catch (error) {
    await stop();
    throw error;
  }
}

async function kioskPath(url, network, demoPassword) {
  const { token, station } = await demoGallery(url, demoPassword);
  const device = { Authorization: `Bearer ${await deviceToken(url, token, station.id)}` };
  const first = await fetch(`${url}/api/kiosk/manifest`, { headers: device });
  const body = Buffer.from(await first.arrayBuffer());
  const etag = first.headers.get('etag');
  const unchanged = { ...device, 'If-None-Match': etag };
  const bare = await bareServer(body, etag);
  try {
    const figures = await inRounds([
      { what: `bare node:http, 200 (${body.length} bytes; the reference)`, url: bare.url },
      { what: 'bare node:http, 304', url: bare.url, headers: { 'If-None-Match': etag }, status: 304 },
      { what: 'GET /api/kiosk/manifest, 200', url: `${url}/api/kiosk/manifest`, headers: device, goal: GOALS.manifest },
      { what: 'GET /api/kiosk/manifest, 304 (If-None-Match)', url: `${url}/api/kiosk/manifest`, headers: unchanged, status: 304, goal: GOALS.notModified },
      ...(network ? [
        { what: `PAIRED_KIOSK_RECHECK_MS=${RECHECK_MS}: GET /api/kiosk/manifest, 200`, url: `${network.recheckUrl}/api/kiosk/manifest`, headers: device, goal: GOALS.manifest },
        { what: `PAIRED_KIOSK_RECHECK_MS=${RECHECK_MS}: GET /api/kiosk/manifest, 304`, url: `${network.recheckUrl}/api/kiosk/manifest`, headers: unchanged, status: 304, goal: GOALS.notModified },
        { what: 'two instances behind nginx: GET /api/kiosk/manifest, 200', url: `${network.url}/api/kiosk/manifest`, headers: device },
        { what: 'two instances behind nginx: GET /api/kiosk/manifest, 304', url: `${network.url}/api/kiosk/manifest`, headers: unchanged, status: 304 },
      ] : []),
    ]);
    const [, bareNotModified, , notModified] = figures;
    return {
      title: 'Kiosk manifest poll against a bare node:http server with the same bytes',
      figures,
      notes: [
        'With the default PAIRED_KIOSK_RECHECK_MS=0 each poll waits for a device-token read that began after it arrived: a CPU profile of that instance under this load finds it idle about half the time, waiting on MariaDB. With the recheck allowed, a poll is answered without waiting.',
        `The 304 poll against the bare server's own 304 (no body, two headers where ours carries the security headers): ${(notModified.perSecond / bareNotModified.perSecond).toFixed(2)} (medians).`,
        ...(network ? [] : ['No venue-network figures: the bench was pointed at a server it did not start (MANTLEPIECE_URL).']),
      ],
      ok: figures.every((figure) => figure.goal === undefined || figure.ratio >= figure.goal),
    };
  } finally {
    await bare.stop();
  }
}

/** Paired kiosks that write for the bench: one writer would only measure the lock on its own row. */
const WRITING_KIOSKS = 32;
/** Visitor events a kiosk sends in one upload: a minute of a busy screen (common practice, no source). */
const EVENTS_PER_UPLOAD = 20;

/** The demo admin's access token: stations are an admin's to add. */
async function adminToken(url, demoPassword) {
  const login = await fetch(`${url}/api/auth/login`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email: 'admin@demo.test', password: demoPassword }) });
  if (!login.ok) throw new Error(`signing in as the demo admin answered ${login.status}`);
  return (await login.json()).accessToken;
}

/** Pairs a kiosk to each of WRITING_KIOSKS new stations of the demo gallery; gives back their device tokens. */
async function writingKiosks(url, demoPassword) {
  const { token, gallery } = await demoGallery(url, demoPassword);
  const admin = await adminToken(url, demoPassword);
  const run = randomUUID().slice(0, 8);
  const tokens = [];
  for (let index = 0; index < WRITING_KIOSKS; index += 1) {
    const response = await fetch(`${url}/api/stations`, {
      method: 'POST',
      headers: { Authorization: `Bearer ${admin}`, 'Content-Type': 'application/json' },
      body: JSON.stringify({ galleryId: gallery.id, name: `Bench ${run} ${index + 1}`, screenWidthPx: 1920, screenHeightPx: 1080, orientation: 'landscape', mountingHeightMm: 1200 }),
    });
    if (!response.ok) throw new Error(`adding a bench station answered ${response.status}: ${await response.text()}`);
    tokens.push(await deviceToken(url, token, (await response.json()).id));
  }
  return tokens;
}

/** One request per kiosk, taken in turn by every connection; setupRequest gives each events upload new event ids. */
const fromEveryKiosk = (tokens, path, body) => tokens.map((token) => ({
  method: 'POST',
  path,
  headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
  setupRequest: (request) => ({ ...request, body: JSON.stringify(body()) }),
}));

/**
 * The writes every kiosk makes all day, which the sizing rests on: a heartbeat (an insert and an
 * update of the kiosk's row, in one transaction) and an upload of visitor events (one multi-row
 * INSERT IGNORE), from WRITING_KIOSKS kiosks at once, against /api/health.
 */
async function kioskWrites(url, demoPassword) {
  const tokens = await writingKiosks(url, demoPassword);
  const heartbeat = () => ({ releaseId: null, appVersion: '0.1.0', uptimeS: 60, storageUsedBytes: 1_000_000, lastError: null });
  const events = () => ({
    events: Array.from({ length: EVENTS_PER_UPLOAD }, () => ({ id: randomUUID(), type: 'language_chosen', at: new Date().toISOString(), locale: 'fr' })),
  });
  const figures = await inRounds([
    { what: 'GET /api/health (the reference)', url: `${url}/api/health` },
    { what: `POST /api/kiosk/heartbeat, ${WRITING_KIOSKS} kiosks`, url, requests: fromEveryKiosk(tokens, '/api/kiosk/heartbeat', heartbeat), status: 204 },
    { what: `POST /api/kiosk/events, ${WRITING_KIOSKS} kiosks, ${EVENTS_PER_UPLOAD} events each`, url, requests: fromEveryKiosk(tokens, '/api/kiosk/events', events) },
  ]);
  return { title: 'Kiosk heartbeats and visitor events (writes) against /api/health', figures, notes: [], ok: true };
}

async function studioLists(url, network, demoPassword) {
  const auth = { Authorization: `Bearer ${await adminToken(url, demoPassword)}` };
  const lists = ['/api/stories', '/api/media', '/api/galleries', '/api/kiosks', '/api/audit'].map((path) => `${path}?page=1&pageSize=25`);
  const figures = await inRounds([
    { what: 'GET /api/health (the reference)', url: `${url}/api/health` },
    ...lists.map((route) => ({ what: `GET ${route}`, url: `${url}${route}`, headers: auth })),
    ...(network ? [{ what: `two instances behind nginx: GET ${lists[0]}`, url: `${network.url}${lists[0]}`, headers: auth }] : []),
  ]);
  return { title: 'Studio list routes against /api/health (the demo data, admin)', figures, notes: [], ok: true };
}

const server = await benchServer();
let sections;
let load;
try {
  const network = await venueNetwork(server);
  try {
    const before = loadavg()[0];
    sections = [
      await kioskPath(server.url, network, server.demoPassword),
      await kioskWrites(server.url, server.demoPassword),
      await studioLists(server.url, network, server.demoPassword),
    ];
    load = [before, loadavg()[0]];
  } finally {
    await network?.stop();
  }
} finally {
  await server.stop();
}

const report = [
  '# Server bench',
  '',
  `${CONNECTIONS} connections on loopback, load from autocannon in the bench's own process, ${ROUNDS} rounds: in each round every figure of a table`,
  `is measured once, in table order, for ${SECONDS} s after ${WARM_UP_SECONDS} s of warm-up. Requests/s and p99 are medians over the rounds (autocannon's`,
  'mean and p99 of each round); the ratio is the median of the rounds\' own ratios to the reference measured in the same round, and the',
  'range the lowest and highest of those. The venue-network rows are two server instances behind nginx (Debian\'s package, round robin,',
  `keep-alive to the instances) on the same MariaDB. ${cpus().length} cores shared by the load generator, the servers, nginx, MariaDB, the reference`,
  `and whatever else ran: one-minute load average ${load[0].toFixed(1)} at the start, ${load[1].toFixed(1)} at the end.`,
  '',
  ...sections.flatMap((section) => [
    `## ${section.title}`,
    '',
    '| what | requests/s | p99 ms | ratio | ratio range | goal |',
    '| --- | ---: | ---: | ---: | ---: | --- |',
    ...section.figures.map(row),
    '',
    ...section.notes.flatMap((note) => [note, '']),
  ]),
].join('\n');
writeFileSync(new URL('./REPORT.md', import.meta.url), report);
console.log(report);
if (!sections.every((section) => section.ok)) process.exitCode = 1;
