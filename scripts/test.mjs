// `npm test`: `npm run lint` (types and ESLint, counted as one check), then the same stack as
// `npm start` on a throwaway data folder and free ports, every workspace's suite against it, then
// everything stopped. Ends with "N passed, N failed, N skipped".
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { phase } from './lib/phase.mjs';
import { run } from './lib/processes.mjs';
import { freePort } from './lib/ports.mjs';
import { ensureDebianPackage } from './lib/debian.mjs';
import { ensureDependencies, root, startStack } from './lib/stack.mjs';

const workspaces = ['shared', 'server', 'studio', 'kiosk', 'test'];
// `node scripts/test.mjs server test -- browser/review` runs those workspaces, passing what follows `--` to vitest as file filters;
// the lint check runs when no workspace is named, or when `lint` is.
const separator = process.argv.indexOf('--');
const only = process.argv.slice(2, separator === -1 ? undefined : separator);
const filters = separator === -1 ? [] : process.argv.slice(separator + 1);
const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'mantlepiece-test-'));
let stack;
let passed = 0;
let failed = 0;
let skipped = 0;
const broken = [];
const failures = [];

/** Each failed test, and each file that failed before its tests ran, from a vitest JSON report. */
const failedNames = (workspace, summary) => summary.testResults.flatMap((file) => {
  const where = `${workspace}/${path.relative(path.join(root, workspace), file.name)}`;
  const tests = file.assertionResults.filter((test) => test.status === 'failed').map((test) => `${where} › ${test.fullName}`);
  return tests.length || file.status !== 'failed' ? tests : [`${where} (${file.message.split('\n')[0]})`];
});

async function finish(code) {
  await stack?.stop();
  if (!process.env.KEEP_TEST_DATA) fs.rmSync(dataDir, { recursive: true, force: true });
  console.log(`\n${passed} passed, ${failed} failed, ${skipped} skipped`);
  process.exit(code);
}
process.on('SIGINT', () => finish(130));
process.on('SIGTERM', () => finish(143));

try {
  ensureDependencies();
  if (!only.length || only.includes('lint')) {
    phase('lint', 'npm run lint');
    if (run('node', [path.join(root, 'scripts/lint.mjs')], { cwd: root }).status === 0) {
      passed += 1;
    } else {
      failed += 1;
      failures.push('lint (npm run lint)');
    }
    if (only.length === 1) await finish(failed === 0 ? 0 : 1);
  }
  ensureDebianPackage({ command: 'chromium', pkg: 'chromium', phaseName: 'browser' });
  stack = await startStack({
    dataDir,
    dbPort: await freePort(),
    smtpPort: await freePort(),
    s3Port: await freePort(),
    replicationPorts: { primaryPort: await freePort(), replicaPort: await freePort() },
    port: await freePort(),
    demoPassword: 'mantlepiece-demo',
    nodeEnv: 'test',
    extraDatabases: ['mantlepiece_api'],
  });
  const env = { ...stack.env, MANTLEPIECE_URL: stack.url, CHROMIUM_PATH: '/usr/bin/chromium' };
  for (const workspace of only.length ? only.filter((name) => name !== 'lint') : workspaces) {
    phase('tests', workspace);
    const report = path.join(dataDir, `vitest-${workspace}.json`);
    const result = run('npx', ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...(filters.length ? ['--passWithNoTests', ...filters] : [])], {
      cwd: path.join(root, workspace), env,
    });
    if (!fs.existsSync(report)) {
      broken.push(workspace);
      failed += 1;
      continue;
    }
    const summary = JSON.parse(fs.readFileSync(report, 'utf8'));
    passed += summary.numPassedTests;
    failed += summary.numFailedTests;
    skipped += summary.numPendingTests + summary.numTodoTests;
    failures.push(...failedNames(workspace, summary));
    // A suite that fails to load counts as a failure even though none of its tests ran.
    if (result.status !== 0 && summary.numFailedTests === 0) {
      broken.push(workspace);
      failed += 1;
    }
  }
  // Named again at the end, beside the count, so a log cut to its tail still says what failed.
  if (failures.length) console.error(`Failed:\n${failures.map((name) => `  ✖ ${name}`).join('\n')}`);
  if (broken.length) console.error(`Suites that did not run cleanly: ${broken.join(', ')}`);
  await finish(failed === 0 ? 0 : 1);
} catch (error) {
  console.error(`\n✖ ${error.message}`);
  failed += 1;
  await finish(1);
}
