// Server benchmark (issue 15), not a timed test: `npm run bench -w server`. Every figure is a ratio
// against a reference measured in the same run on the same machine: the kiosk manifest poll against
// a bare node:http server answering the same bytes, the studio's list routes against /api/health.
// Needs a server: MANTLEPIECE_URL when set, else a private stack on free ports (kiosk/bench/bench-server.mjs).
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, tmpdir } from 'node:os';
import { join } from 'node:path';
import autocannon from 'autocannon';
import { benchServer, demoGallery, deviceToken } from '../../kiosk/bench/bench-server.mjs';

/** As the issue measured them: 16 connections on loopback; each run after a warm-up of its own. */
const CONNECTIONS = 16;
const SECONDS = Number(process.env.BENCH_SECONDS ?? 8);
const WARM_UP_SECONDS = 2;
const GOALS = { manifest: 0.5, notModified: 0.8 };

async function load(url, headers = {}, expectStatus = 200) {
  await autocannon({ url, headers, connections: CONNECTIONS, duration: WARM_UP_SECONDS });
  const result = await autocannon({ url, headers, connections: CONNECTIONS, duration: SECONDS });
  const expected = result.statusCodeStats[expectStatus]?.count ?? 0;
  const total = Object.values(result.statusCodeStats).reduce((sum, { count }) => sum + count, 0);
  if (total === 0 || expected !== total) throw new Error(`${url} answered ${JSON.stringify(result.statusCodeStats)}, not only ${expectStatus}`);
  return { perSecond: result.requests.average, p99Ms: result.latency.p99 };
}

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

const row = (what, figure, reference, goal) =>
  `| ${what} | ${Math.round(figure.perSecond)} | ${figure.p99Ms} | ${Math.round(reference.perSecond)} | ${(figure.perSecond / reference.perSecond).toFixed(2)} | ${goal === undefined ? '—' : `≥ ${goal} ${figure.perSecond / reference.perSecond >= goal ? 'met' : '**not met**'}`} |`;

async function kioskPath(url, demoPassword) {
  const { token, station } = await demoGallery(url, demoPassword);
  const device = { Authorization: `Bearer ${await deviceToken(url, token, station.id)}` };
  const manifestUrl = `${url}/api/kiosk/manifest`;
  const first = await fetch(manifestUrl, { headers: device });
  const body = Buffer.from(await first.arrayBuffer());
  const etag = first.headers.get('etag');
  const bare = await bareServer(body, etag);
  try {
    const reference = await load(bare.url);
    const bareNotModified = await load(bare.url, { 'If-None-Match': etag }, 304);
    const manifest = await load(manifestUrl, device);
    const notModified = await load(manifestUrl, { ...device, 'If-None-Match': etag }, 304);
    const rows = [
      row(`bare node:http, 200 (${body.length} bytes)`, reference, reference),
      row('bare node:http, 304', bareNotModified, reference),
      row('GET /api/kiosk/manifest, 200', manifest, reference, GOALS.manifest),
      row('GET /api/kiosk/manifest, 304 (If-None-Match)', notModified, reference, GOALS.notModified),
    ];
    const ok = manifest.perSecond / reference.perSecond >= GOALS.manifest && notModified.perSecond / reference.perSecond >= GOALS.notModified;
    return { title: 'Kiosk manifest poll against a bare node:http server with the same bytes', rows, ok };
  } finally {
    await bare.stop();
  }
}

async function studioLists(url, demoPassword) {
  const login = await fetch(`${url}/api/auth/login`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email: 'admin@demo.test', password: demoPassword }) });
  if (!login.ok) throw new Error(`signing in as the demo admin answered ${login.status}`);
  const auth = { Authorization: `Bearer ${(await login.json()).accessToken}` };
  const health = await load(`${url}/api/health`);
  const rows = [row('GET /api/health (reference)', health, health)];
  for (const route of ['/api/stories?page=1&pageSize=25', '/api/media?page=1&pageSize=25', '/api/galleries?page=1&pageSize=25', '/api/kiosks?page=1&pageSize=25', '/api/audit?page=1&pageSize=25']) {
    rows.push(row(`GET ${route}`, await load(`${url}${route}`, auth), health));
  }
  return { title: 'Studio list routes against /api/health (the demo data, admin)', rows, ok: true };
}

const server = await benchServer();
let sections;
try {
  sections = [await kioskPath(server.url, server.demoPassword), await studioLists(server.url, server.demoPassword)];
} finally {
  await server.stop();
}

const report = [
  '# Server bench',
  '',
  `${CONNECTIONS} connections on loopback, ${SECONDS} s per figure after ${WARM_UP_SECONDS} s of warm-up, load from autocannon in the bench's own process;`,
  `${cpus().length} cores shared by the load generator, the server, MariaDB and the reference. Requests per second are autocannon's mean.`,
  '',
  ...sections.flatMap((section) => [
    `## ${section.title}`,
    '',
    '| what | requests/s | p99 ms | reference requests/s | ratio | goal |',
    '| --- | ---: | ---: | ---: | ---: | --- |',
    ...section.rows,
    '',
  ]),
].join('\n');
writeFileSync(new URL('./REPORT.md', import.meta.url), report);
console.log(report);
if (!sections.every((section) => section.ok)) process.exitCode = 1;
