// Kiosk benchmark (issue 7), not a timed test: `npm run bench -w kiosk` after `npm run build -w kiosk`.
// Each section returns rows for REPORT.md. The offline boot and release sync sections need a server:
// MANTLEPIECE_URL when set, else a private stack on free ports (see bench-server.mjs).
import { readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { serverSections } from './server-sections.mjs';

const DIST = new URL('../dist/', import.meta.url);
const BUDGET_BYTES = 300 * 1024;
// Fonts are shipped with the app but counted apart, as the issue asks.
const CODE = /\.(js|css)$/;

function files(dir) {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? files(path) : [path];
  });
}

function bundleSize() {
  const dist = DIST.pathname;
  const code = files(dist).filter((path) => CODE.test(path));
  const rows = code.map((path) => ({ file: path.slice(dist.length), raw: statSync(path).size, gzip: gzipSync(readFileSync(path), { level: 9 }).byteLength }));
  const total = rows.reduce((sum, row) => sum + row.gzip, 0);
  const lines = [
    '| file | bytes | gzipped |',
    '| --- | ---: | ---: |',
    ...rows.map((row) => `| ${row.file} | ${row.raw} | ${row.gzip} |`),
    `| **total JS + CSS** | | **${total}** (${(total / 1024).toFixed(1)} KB of ${BUDGET_BYTES / 1024} KB) |`,
  ];
  return { title: 'Bundle size (JS + CSS gzipped, fonts apart)', lines, ok: total <= BUDGET_BYTES };
}

const sections = [bundleSize(), ...(await serverSections())];

const report = ['# Kiosk bench', '', ...sections.flatMap((section) => [`## ${section.title}`, '', ...section.lines, ''])].join('\n');
writeFileSync(new URL('./REPORT.md', import.meta.url), report);
console.log(report);
if (!sections.every((section) => section.ok)) {
  console.error('Over budget.');
  process.exitCode = 1;
}
