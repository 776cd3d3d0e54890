// Frame time of the convection cell in headless Chromium with its solver running in the Web Worker:
// the page is built with Vite from the shipped package (so the worker is bundled as an app would
// bundle it), served on loopback, and timed with requestAnimationFrame on the main thread.
import http from 'node:http';
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';
import { chromium } from 'playwright-core';

const here = path.dirname(fileURLToPath(import.meta.url));
const SECONDS = 4;
const CASES = [
  { grid: 64, speed: 2, overlay: 'streamlines' },
  { grid: 128, speed: 2, overlay: 'streamlines' },
  { grid: 128, speed: 2, overlay: 'particles' },
];
const TYPES = { '.html': 'text/html', '.js': 'text/javascript', '.css': 'text/css' };

async function buildPage() {
  const outDir = await fs.mkdtemp(path.join(os.tmpdir(), 'mp-frame-bench-'));
  await build({ root: path.join(here, 'frame-page'), base: './', logLevel: 'error', build: { outDir, emptyOutDir: true, target: 'es2022' } });
  return outDir;
}

function serve(dir) {
  const server = http.createServer(async (request, response) => {
    const file = path.join(dir, new URL(request.url, 'http://x').pathname.replace(/^\/$/, '/index.html'));
    try {
      const body = await fs.readFile(file);
      response.writeHead(200, { 'Content-Type': TYPES[path.extname(file)] ?? 'application/octet-stream' }).end(body);
    } catch {
      response.writeHead(404).end();
    }
  });
  return new Promise((resolve) => server.listen(0, '127.0.0.1', () => resolve(server)));
}

/** rAF intervals on the main thread over `seconds`, and how far the drawing and the solver got meanwhile. */
function measure(seconds) {
  return new Promise((resolve) => {
    const canvas = document.querySelector('canvas');
    const time = document.querySelector('[data-readout="time"]');
    const startFrames = Number(canvas.dataset.frames ?? 0);
    const startTime = Number(time.textContent);
    const intervals = [];
    let last;
    const end = performance.now() + seconds * 1000;
    const tick = (now) => {
      if (last !== undefined) intervals.push(now - last);
      last = now;
      if (now < end) requestAnimationFrame(tick);
      else resolve({ intervals, drawn: Number(canvas.dataset.frames) - startFrames, modelTime: Number(time.textContent) - startTime });
    };
    requestAnimationFrame(tick);
  });
}

const percentile = (sorted, p) => sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))];

export async function run() {
  const dir = await buildPage();
  const server = await serve(dir);
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const rows = [];
  try {
    for (const { grid, speed, overlay } of CASES) {
      const page = await browser.newPage({ viewport: { width: 900, height: 900 } });
      await page.goto(`http://127.0.0.1:${server.address().port}/?grid=${grid}&speed=${speed}&overlay=${overlay}`);
      await page.waitForFunction(() => Number(document.querySelector('canvas')?.dataset.frames ?? 0) > 30);
      const { intervals, drawn, modelTime } = await page.evaluate(measure, SECONDS);
      const sorted = [...intervals].sort((a, b) => a - b);
      rows.push([
        `${grid} × ${grid}`,
        speed,
        overlay,
        percentile(sorted, 0.5).toFixed(1),
        percentile(sorted, 0.95).toFixed(1),
        sorted[sorted.length - 1].toFixed(1),
        (drawn / SECONDS).toFixed(0),
        modelTime > 0 ? 'yes' : 'no',
      ]);
      await page.close();
    }
  } finally {
    await browser.close();
    server.close();
    await fs.rm(dir, { recursive: true, force: true });
  }
  return {
    title: 'Convection cell frame time, headless Chromium, solver in a Web Worker',
    tables: [
      {
        caption: `requestAnimationFrame intervals on the main thread over ${SECONDS} s, Ra = 1e4, A = 1, 640 px wide`,
        columns: ['grid', 'steps/frame', 'overlay', 'median ms', 'p95 ms', 'max ms', 'frames drawn/s', 'model time advanced'],
        rows,
      },
    ],
    notes: [
      'Chromium runs headless with --disable-gpu, so drawing is software-composited; a kiosk with a GPU draws faster.',
      'The page asks the worker for the next solver frame only after drawing the last, so a slow solver lowers the simulation rate, not the frame rate.',
      `The page is a Vite build of bench/frame-page against shared/dist, as an app consumes the package (the worker is bundled from new URL('./convection.worker.js', import.meta.url)).`,
    ],
  };
}
