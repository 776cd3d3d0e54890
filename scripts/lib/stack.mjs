// Brings up everything Mantlepiece needs on one machine, in order, and takes it down again:
// private MariaDB → database and user → server build → migrations → demo seed → SMTP stand-in →
// studio and kiosk builds → NestJS server. Used by `npm start` and `npm test` alike.
import fs from 'node:fs';
import path from 'node:path';
import crypto from 'node:crypto';
import { fileURLToPath } from 'node:url';
import { phase, PhaseError } from './phase.mjs';
import { run, startOwned, waitFor } from './processes.mjs';
import { assertPortFree } from './ports.mjs';
import { followPrimary, startPrivateMariaDb, provisionDatabase } from './mariadb.mjs';

export const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

/** Every non-optional package the lock file names is on disk (content, not mtimes: an
 *  `npm install` elsewhere in the tree must not make a running suite's node_modules vanish). */
function dependenciesInstalled() {
  const lock = JSON.parse(fs.readFileSync(path.join(root, 'package-lock.json'), 'utf8'));
  return Object.entries(lock.packages)
    .filter(([key, entry]) => key.includes('node_modules/') && !entry.optional && !entry.link)
    .every(([key]) => fs.existsSync(path.join(root, key)));
}

export function ensureDependencies() {
  if (dependenciesInstalled()) return;
  phase('dependencies', 'npm ci');
  const result = run('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root });
  if (result.status !== 0) throw new PhaseError('dependencies', 'npm ci failed');
}

function npmRun(script, workspace, phaseName, env) {
  const result = run('npm', ['run', script, '-w', workspace], { cwd: root, quiet: true, env });
  if (result.status !== 0) {
    process.stderr.write(result.stdout + result.stderr);
    throw new PhaseError(phaseName, `npm run ${script} -w ${workspace} failed`);
  }
}

function secrets(dataDir) {
  const file = path.join(dataDir, 'secrets.json');
  if (!fs.existsSync(file)) {
    fs.writeFileSync(file, JSON.stringify({}), { mode: 0o600 });
  }
  // Each secret is made once per data folder; a folder from an older start gains the ones it lacks.
  const known = JSON.parse(fs.readFileSync(file, 'utf8'));
  const wanted = { ...Object.fromEntries(['jwtSecret', 'signingKeySecret'].map((name) => [name, crypto.randomBytes(32).toString('base64url')])), ...known };
  if (Object.keys(wanted).length !== Object.keys(known).length) fs.writeFileSync(file, JSON.stringify(wanted), { mode: 0o600 });
  return wanted;
}

/**
 * Media lived in the checkout (`media/store`) before it moved into the data folder: a data folder
 * from then gets its images back on its next start. Never for a throwaway test data folder.
 */
function adoptCheckoutMedia(dataDir) {
  const legacy = path.join(root, 'media/store');
  const target = path.join(dataDir, 'media');
  if (process.env.MEDIA_DIR || !fs.existsSync(legacy) || fs.existsSync(target)) return;
  phase('media', `moving ${legacy} to ${target}`);
  try {
    fs.renameSync(legacy, target);
  } catch (error) {
    if (error.code !== 'EXDEV') throw error;
    fs.cpSync(legacy, target, { recursive: true });
    fs.rmSync(legacy, { recursive: true, force: true });
  }
}

/** A build is skipped when its output is newer than every source file it comes from. */
function upToDate(output, sources) {
  if (!fs.existsSync(output)) return false;
  const built = fs.statSync(output).mtimeMs;
  const newest = (dir) => {
    if (!fs.existsSync(dir)) return 0;
    const stat = fs.statSync(dir);
    if (!stat.isDirectory()) return stat.mtimeMs;
    return Math.max(stat.mtimeMs, ...fs.readdirSync(dir).filter((n) => n !== 'node_modules' && n !== 'dist').map((n) => newest(path.join(dir, n))));
  };
  return sources.every((source) => newest(source) <= built);
}

function build(workspace, phaseName, output, sources, env) {
  if (upToDate(path.join(root, output), sources.map((s) => path.join(root, s)))) return;
  npmRun('build', workspace, phaseName, env);
}

/** The shared package's dist, which the other workspaces import (and type-check against). */
export function buildShared(phaseName, env) {
  build('shared', phaseName, 'shared/dist/index.js', ['shared/src', 'shared/package.json', 'shared/tsconfig.build.json'], env);
}

/**
 * The settings that point a server at the S3 stand-in (S3_*), from the S3_STAND_IN_* settings the
 * test run hands its suites: the one mapping from one to the other, for every suite that uses it.
 */
export function s3StandInEnv(env = process.env) {
  const endpoint = env.S3_STAND_IN_ENDPOINT;
  if (!endpoint) throw new Error('S3_STAND_IN_ENDPOINT is not set: run this suite through `node scripts/test.mjs`, which starts the S3 stand-in');
  const key = env.S3_STAND_IN_KEY ?? 'S3RVER';
  return { S3_BUCKET: env.S3_STAND_IN_BUCKET ?? 'mantlepiece', S3_ENDPOINT: endpoint, S3_REGION: 'us-east-1', S3_ACCESS_KEY_ID: key, S3_SECRET_ACCESS_KEY: key, S3_FORCE_PATH_STYLE: 'true' };
}

/**
 * The S3 stand-in, for the suites that check object storage. The server keeps the disk: its
 * settings name the stand-in under S3_STAND_IN_*, which a suite turns into S3_* for its own app.
 */
async function startS3StandIn({ dataDir, port, env }) {
  const standIn = { S3_STAND_IN_ENDPOINT: `http://127.0.0.1:${port}`, S3_STAND_IN_BUCKET: 'mantlepiece', S3_STAND_IN_KEY: 'S3RVER' };
  phase('object storage', `S3 stand-in on 127.0.0.1:${port}`);
  const s3 = startOwned('s3-stand-in', 'node', [path.join(root, 'scripts/lib/s3-stand-in.mjs')], {
    env: { ...env, S3_STAND_IN_PORT: String(port), S3_STAND_IN_DIR: path.resolve(dataDir, 's3'), S3_BUCKET: standIn.S3_STAND_IN_BUCKET },
  });
  await waitFor(() => /listening/.test(s3.recentOutput()), {
    what: 'S3 stand-in', timeoutMs: 15000,
    failIf: () => (s3.child.exitCode !== null ? `S3 stand-in exited: ${s3.recentOutput().trim()}` : null),
  }).catch((error) => { throw new PhaseError('object storage', error.message); });
  return { process: s3, env: standIn };
}

/**
 * A primary with a binary log and a read-only replica following it (MariaDB's built-in replication),
 * apart from the app's own database, for the suites that check reads from replicas. Named to those
 * suites under REPLICATION_STAND_IN_*; the server itself keeps one database.
 */
async function startReplicatedPair({ dataDir, primaryPort, replicaPort, owned }) {
  phase('database', `primary ${primaryPort} and replica ${replicaPort} for the replica suites`);
  const primary = await startPrivateMariaDb({ dataDir, port: primaryPort, name: 'mariadb-primary', serverId: 1 });
  owned.push(primary.server);
  const replica = await startPrivateMariaDb({ dataDir, port: replicaPort, name: 'mariadb-replica', serverId: 2, replica: true });
  owned.push(replica.server);
  await followPrimary({ dataDir, primary, replica });
  const url = provisionDatabase({ dataDir, socket: primary.socket, port: primaryPort, databases: ['mantlepiece_replicated'] }).mantlepiece_replicated;
  return {
    REPLICATION_STAND_IN_PRIMARY_URL: url,
    REPLICATION_STAND_IN_REPLICA_URL: url.replace(`:${primaryPort}/`, `:${replicaPort}/`),
    REPLICATION_STAND_IN_PRIMARY_SOCKET: primary.socket,
    REPLICATION_STAND_IN_REPLICA_SOCKET: replica.socket,
  };
}

export async function startStack(options) {
  const { dataDir, dbPort, smtpPort, s3Port, replicationPorts, port, demoPassword, nodeEnv = 'development', extraDatabases = [] } = options;
  const owned = [];
  const stop = async () => {
    for (const proc of owned.reverse()) await proc.stop();
    owned.length = 0;
  };
  try {
    fs.mkdirSync(dataDir, { recursive: true });
    const external = process.env.DATABASE_URL;
    phase('ports', `server ${port}, SMTP ${smtpPort}${external ? '' : `, MariaDB ${dbPort}`}`);
    await assertPortFree(port, 'server');
    await assertPortFree(smtpPort, 'SMTP stand-in');
    if (s3Port) await assertPortFree(s3Port, 'S3 stand-in');
    if (!external) await assertPortFree(dbPort, 'MariaDB');

    let databaseUrls = { mantlepiece: external };
    if (!external) {
      phase('database', `private MariaDB in ${path.join(dataDir, 'mariadb')}`);
      const db = await startPrivateMariaDb({ dataDir, port: dbPort });
      owned.push(db.server);
      databaseUrls = provisionDatabase({ dataDir, socket: db.socket, port: dbPort, databases: ['mantlepiece', ...extraDatabases] });
    }

    if (nodeEnv !== 'test') adoptCheckoutMedia(dataDir);
    const mailDir = path.resolve(dataDir, 'mail');
    const dataSecrets = secrets(dataDir);
    const env = {
      ...process.env,
      NODE_ENV: nodeEnv,
      DATA_DIR: path.resolve(dataDir),
      DATABASE_URL: databaseUrls.mantlepiece,
      PORT: String(port),
      HOST: '127.0.0.1',
      PUBLIC_URL: process.env.PUBLIC_URL ?? `http://127.0.0.1:${port}`,
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(smtpPort),
      MAIL_DIR: mailDir,
      JWT_SECRET: process.env.JWT_SECRET ?? dataSecrets.jwtSecret,
      SIGNING_KEY_SECRET: process.env.SIGNING_KEY_SECRET ?? dataSecrets.signingKeySecret,
      DEMO_PASSWORD: demoPassword,
      STUDIO_DIST: path.join(root, 'studio/dist'),
      KIOSK_DIST: path.join(root, 'kiosk/dist'),
    };
    for (const db of extraDatabases) env[`DATABASE_URL_${db.toUpperCase()}`] = databaseUrls[db];

    phase('build', 'shared package and server');
    buildShared('build', env);
    build('server', 'build', 'server/dist/main.js', ['server/src', 'server/package.json', 'server/tsconfig.build.json', 'shared/src'], env);

    phase('migrations');
    const migrate = run('node', ['server/dist/cli.js', 'migrate'], { cwd: root, env, quiet: true });
    if (migrate.status !== 0) throw new PhaseError('migrations', (migrate.stderr || migrate.stdout).trim());
    if (nodeEnv !== 'production') {
      phase('demo scenario', 'seeded on first start only');
      const seed = run('node', ['server/dist/cli.js', 'seed'], { cwd: root, env, quiet: true });
      if (seed.status !== 0) throw new PhaseError('demo scenario', (seed.stderr || seed.stdout).trim());
    }

    phase('mail', `SMTP stand-in on 127.0.0.1:${smtpPort}, messages in ${mailDir}`);
    const smtp = startOwned('smtp-stand-in', 'node', [path.join(root, 'scripts/lib/smtp-stand-in.mjs')], { env });
    owned.push(smtp);
    await waitFor(() => /listening/.test(smtp.recentOutput()), {
      what: 'SMTP stand-in', timeoutMs: 15000,
      failIf: () => (smtp.child.exitCode !== null ? `SMTP stand-in exited: ${smtp.recentOutput().trim()}` : null),
    }).catch((error) => { throw new PhaseError('mail', error.message); });

    if (replicationPorts) Object.assign(env, await startReplicatedPair({ dataDir, ...replicationPorts, owned }));

    if (s3Port) {
      const s3 = await startS3StandIn({ dataDir, port: s3Port, env });
      owned.push(s3.process);
      Object.assign(env, s3.env);
    }

    phase('apps', 'building studio and kiosk');
    build('studio', 'apps', 'studio/dist/index.html', ['studio/src', 'studio/index.html', 'studio/vite.config.ts', 'shared/src'], env);
    build('kiosk', 'apps', 'kiosk/dist/index.html', ['kiosk/src', 'kiosk/index.html', 'kiosk/vite.config.ts', 'shared/src'], env);

    phase('server', `NestJS on 127.0.0.1:${port}`);
    const server = startOwned('server', 'node', ['server/dist/main.js'], { cwd: root, env, echo: options.echoServer });
    owned.push(server);
    await waitFor(async () => (await fetch(`http://127.0.0.1:${port}/api/health`)).ok, {
      what: 'server', timeoutMs: 60000,
      failIf: () => (server.child.exitCode !== null ? `server exited: ${server.recentOutput().trim().split('\n').slice(-8).join('\n')}` : null),
    }).catch((error) => { throw new PhaseError('server', error.message); });

    return { env, url: `http://127.0.0.1:${port}`, stop, processes: owned };
  } catch (error) {
    await stop();
    throw error;
  }
}
