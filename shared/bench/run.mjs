// npm run bench -w shared: runs each bench section in turn, prints its tables and writes
// bench/REPORT.md. A section is a module whose run() resolves to { title, tables, notes }, each
// table { caption, columns, rows }; add a section by adding its module to `sections`.
import { writeFile } from 'node:fs/promises';
import os from 'node:os';
import * as convectionNode from './convection-node.mjs';
import * as framesChromium from './frames-chromium.mjs';

const sections = [convectionNode, framesChromium];

function markdownTable({ caption, columns, rows }) {
  const line = (cells) => `| ${cells.join(' | ')} |`;
  return [`**${caption}**`, '', line(columns), line(columns.map(() => '---')), ...rows.map(line)].join('\n');
}

function printTable({ caption, columns, rows }) {
  const widths = columns.map((c, i) => Math.max(c.length, ...rows.map((r) => String(r[i]).length)));
  const line = (cells) => cells.map((cell, i) => String(cell).padEnd(widths[i])).join('  ');
  console.log(`\n${caption}\n${line(columns)}\n${widths.map((w) => '-'.repeat(w)).join('  ')}`);
  for (const row of rows) console.log(line(row));
}

const machine = `${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown CPU'}), ${os.platform()} ${os.arch()}, Node ${process.version}`;
const date = new Date().toISOString().slice(0, 10);
console.log(`Mantlepiece shared bench — ${date} — ${machine}`);

const parts = [`# Shared bench report\n\nRun on ${date}, ${machine}, by \`npm run bench -w shared\`.`];
for (const section of sections) {
  const result = await section.run();
  console.log(`\n== ${result.title} ==`);
  result.tables.forEach(printTable);
  for (const note of result.notes) console.log(`- ${note}`);
  parts.push(`## ${result.title}`, ...result.tables.map(markdownTable), result.notes.map((n) => `- ${n}`).join('\n'));
}
await writeFile(new URL('./REPORT.md', import.meta.url), `${parts.join('\n\n')}\n`);
console.log('\nWrote bench/REPORT.md');
