// The kiosk bench's sections that need a server (issue 7): offline boot against a blank page, and
// release sync against plain downloads of the same files, each pair measured in one headless
// Chromium run so the machine's speed cancels out of the ratio; then the soak (soak-section.mjs).
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { benchServer, demoGallery, deviceToken, liveManifest, pairStation } from './bench-server.mjs';
import { soak } from './soak-section.mjs';

const RUNS = 5;
const SYNC_RUNS = 3;
const BLANK_PATH = '/bench-blank.html';
const CHROMIUM = {
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  headless: true,
  args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
};

// Runs in the kiosk page before its own scripts: notes when the first manifest request leaves and
// the frame after the attract loop's first story highlight is in the document (the first drawn panel).
const MARKS = () => {
  const marks = {};
  window.__kioskBench = marks;
  const fetchBefore = window.fetch.bind(window);
  window.fetch = (input, init) => {
    if (marks.manifestAt === undefined && String(input instanceof Request ? input.url : input).includes('/api/kiosk/manifest')) marks.manifestAt = performance.now();
    return fetchBefore(input, init);
  };
  new MutationObserver((_changes, observer) => {
    if (!document.querySelector('.highlight')) return;
    observer.disconnect();
    requestAnimationFrame(() => { marks.firstPanelAt = performance.now(); });
  }).observe(document, { childList: true, subtree: true });
};

const median = (values) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
const ms = (value) => `${value.toFixed(0)} ms`;

async function kioskProfile(url) {
  const dir = mkdtempSync(join(tmpdir(), 'mantlepiece-kiosk-bench-profile-'));
  const context = await chromium.launchPersistentContext(dir, { ...CHROMIUM, viewport: { width: 1920, height: 1080 }, hasTouch: true });
  await context.addInitScript(MARKS);
  // A blank page on the server's origin, answered by the browser itself like the offline kiosk's own files.
  await context.route(`${url}${BLANK_PATH}`, (route) => route.fulfill({ contentType: 'text/html', body: '<!doctype html><title>blank</title>' }));
  const page = context.pages()[0] ?? (await context.newPage());
  return { context, page, close: async () => { await context.close(); rmSync(dir, { recursive: true, force: true }); } };
}

/** Opens the kiosk in a fresh profile, pairs it at the demo station and waits for the first drawn panel. */
async function pairedKiosk(server, demo, path = '/kiosk/?poll=1') {
  const kiosk = await kioskProfile(server.url);
  await kiosk.page.goto(`${server.url}${path}`);
  const shown = kiosk.page.locator('[data-pairing-code]');
  await shown.waitFor({ timeout: 30_000 });
  await pairStation(server.url, demo.token, demo.station.id, await shown.getAttribute('data-pairing-code'));
  await kiosk.page.waitForFunction(() => window.__kioskBench.firstPanelAt !== undefined, undefined, { timeout: 60_000 });
  return kiosk;
}

const marks = (page) => page.evaluate(() => window.__kioskBench);

async function offlineBoot(server, demo) {
  const kiosk = await pairedKiosk(server, demo);
  try {
    await kiosk.page.waitForFunction(() => navigator.serviceWorker.controller !== null);
    const blank = [];
    for (let run = 0; run < RUNS; run++) {
      await kiosk.page.goto(`${server.url}${BLANK_PATH}`);
      blank.push(await kiosk.page.evaluate(() => performance.getEntriesByType('navigation')[0].loadEventEnd));
    }
    await kiosk.context.setOffline(true);
    const boot = [];
    for (let run = 0; run < RUNS; run++) {
      await kiosk.page.goto(`${server.url}/kiosk/?poll=1`);
      await kiosk.page.waitForFunction(() => window.__kioskBench.firstPanelAt !== undefined);
      boot.push((await marks(kiosk.page)).firstPanelAt);
    }
    const ratio = median(boot) / median(blank);
    return {
      title: 'Offline boot',
      lines: [
        `Network cut (Playwright offline context), the app from its service worker, the release from IndexedDB (signature checked again at boot); median of ${RUNS} loads each, from navigation start.`,
        '',
        '| measure | median | runs |',
        '| --- | ---: | --- |',
        `| kiosk to its first drawn panel (the frame after the attract loop's first story highlight) | ${ms(median(boot))} | ${boot.map(ms).join(', ')} |`,
        `| blank page on the same origin, to its load event | ${ms(median(blank))} | ${blank.map(ms).join(', ')} |`,
        `| **ratio** | **${ratio.toFixed(1)} ×** | |`,
      ],
      ok: true,
    };
  } finally {
    await kiosk.close();
  }
}

async function releaseSync(server, demo) {
  const device = await deviceToken(server.url, demo.token, demo.station.id);
  const manifest = await liveManifest(server.url, device);
  const bytes = manifest.files.reduce((sum, file) => sum + file.size, 0);
  const plainRunner = await kioskProfile(server.url);
  const plain = [];
  try {
    await plainRunner.page.goto(`${server.url}${BLANK_PATH}`);
    for (let run = 0; run < SYNC_RUNS; run++) {
      // One after another, as the kiosk fetches them, past the HTTP cache, nothing checked or stored.
      plain.push(await plainRunner.page.evaluate(async ({ files, token }) => {
        const started = performance.now();
        for (const file of files) await (await fetch(`/api/kiosk/files/${file.sha256}`, { headers: { Authorization: `Bearer ${token}` }, cache: 'no-store' })).arrayBuffer();
        return performance.now() - started;
      }, { files: manifest.files, token: device }));
    }
  } finally {
    await plainRunner.close();
  }
  const sync = [];
  for (let run = 0; run < SYNC_RUNS; run++) {
    const kiosk = await pairedKiosk(server, demo);
    const { manifestAt, firstPanelAt } = await marks(kiosk.page);
    sync.push(firstPanelAt - manifestAt);
    await kiosk.close();
  }
  const ratio = median(sync) / median(plain);
  return {
    title: 'Release sync',
    lines: [
      `Release ${manifest.number} of ${demo.gallery.name}: ${manifest.stories.length} stories, ${manifest.files.length} files, ${bytes} bytes. Median of ${SYNC_RUNS} runs each, every sync in a fresh browser profile.`,
      '',
      '| measure | median | runs |',
      '| --- | ---: | --- |',
      `| kiosk sync: first manifest request to the first drawn panel (signature, downloads, SHA-256 of every file, IndexedDB, switch) | ${ms(median(sync))} | ${sync.map(ms).join(', ')} |`,
      `| plain downloads of the same files, one after another, in a page of the same browser | ${ms(median(plain))} | ${plain.map(ms).join(', ')} |`,
      `| **ratio** | **${ratio.toFixed(1)} ×** | |`,
    ],
    ok: true,
  };
}

export async function serverSections() {
  const server = await benchServer();
  try {
    const demo = await demoGallery(server.url, server.demoPassword);
    const where = server.started ? `a private stack started for the bench (${server.url})` : `MANTLEPIECE_URL (${server.url})`;
    const sections = [await offlineBoot(server, demo), await releaseSync(server, demo), await soak(pairedKiosk, server, demo)];
    for (const section of sections) section.lines.push('', `Server: ${where}. Chromium: ${CHROMIUM.executablePath}, headless.`);
    return sections;
  } finally {
    await server.stop();
  }
}
