// `npm run lint`: `tsc --noEmit` over every workspace, its tests included, then ESLint (eslint.config.js:
// type-aware typescript-eslint rules, the React hooks rules and the formatting rules) over the whole
// tree. Every check runs even after one fails; each failure is named at the end and the exit code is 1.
import { phase } from './lib/phase.mjs';
import { run } from './lib/processes.mjs';
import { buildShared, root } from './lib/stack.mjs';

// The first type-checks its sources and unit tests; the others import its built declarations.
const projects = ['shared/tsconfig.json', 'server/tsconfig.test.json', 'studio/tsconfig.json', 'kiosk/tsconfig.json', 'test/tsconfig.json'];
const failed = [];
const started = Date.now();

try {
  buildShared('types', process.env);
} catch (error) {
  failed.push(error.message);
}
for (const project of projects) {
  phase('types', project);
  if (run('npx', ['tsc', '-p', project, '--noEmit'], { cwd: root }).status !== 0) failed.push(`tsc -p ${project}`);
}
phase('eslint', 'every workspace');
if (run('npx', ['eslint', '.', '--max-warnings=0'], { cwd: root }).status !== 0) failed.push('eslint');

const seconds = Math.round((Date.now() - started) / 1000);
if (failed.length) {
  console.error(`Lint failed (${seconds} s): ${failed.join(', ')}`);
  process.exit(1);
}
console.log(`Lint clean: types and ESLint over every workspace (${seconds} s)`);
