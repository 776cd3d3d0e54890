import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { randomBytes } from 'node:crypto';
import mysql from 'mysql2/promise';
import { startNginx } from '../../scripts/lib/nginx.mjs';
import { freePort } from '../../scripts/lib/ports.mjs';
import { run, startOwned, waitFor, type OwnedProcess } from '../../scripts/lib/processes.mjs';
import { root, s3StandInEnv } from '../../scripts/lib/stack.mjs';

/**
 * A venue network on one machine, as README's operations sections describe it: two server
 * instances behind nginx (Debian's package, round robin on loopback), on a database of their own on
 * the MariaDB primary and replica that `node scripts/test.mjs` starts (REPLICATION_STAND_IN_*),
 * media and releases in the S3 stand-in (S3_STAND_IN_*), and a mail stand-in of their own, so the
 * mail they send can be counted. Migrated and seeded with the demo scenario, as `npm start` does.
 */
export interface ScaleStack {
  /** nginx: where people and kiosks reach the network. */
  url: string;
  instances: Instance[];
  mailDir: string;
  /** The primary and the replica, as the `mantlepiece` user, on the network's own database. */
  primary: mysql.Connection;
  replica: mysql.Connection;
  /** Waits until the replica has applied everything the primary has written so far. */
  replicaCaughtUp(): Promise<void>;
  stop(): Promise<void>;
}

export interface Instance {
  name: string;
  port: number;
  process: OwnedProcess;
}

function standIn(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set: run this suite through \`node scripts/test.mjs test\`, which starts the MariaDB pair and the S3 stand-in`);
  return value;
}

export async function startScaleStack(): Promise<ScaleStack> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'mantlepiece-scale-'));
  const owned: OwnedProcess[] = [];
  const connections: mysql.Connection[] = [];
  const stop = async () => {
    for (const each of owned.reverse()) await each.stop();
    for (const connection of connections) await connection.end().catch(() => undefined);
    fs.rmSync(dir, { recursive: true, force: true });
  };
  try {
    // A database of the network's own on the pair, made on the primary and followed by the replica.
    const database = `mantlepiece_scale_${randomBytes(4).toString('hex')}`;
    const primaryRoot = await mysql.createConnection({ socketPath: standIn('REPLICATION_STAND_IN_PRIMARY_SOCKET'), user: 'root' });
    connections.push(primaryRoot);
    await primaryRoot.query(`CREATE DATABASE \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
    await primaryRoot.query(`GRANT ALL PRIVILEGES ON \`${database}\`.* TO 'mantlepiece'@'127.0.0.1'`);
    const primaryUrl = standIn('REPLICATION_STAND_IN_PRIMARY_URL').replace(/\/[^/]+$/, `/${database}`);
    const replicaUrl = standIn('REPLICATION_STAND_IN_REPLICA_URL').replace(/\/[^/]+$/, `/${database}`);
    const replicaRoot = await mysql.createConnection({ socketPath: standIn('REPLICATION_STAND_IN_REPLICA_SOCKET'), user: 'root' });
    connections.push(replicaRoot);
    const primary = await mysql.createConnection(primaryUrl);
    connections.push(primary);
    const replica = await mysql.createConnection(replicaUrl);
    connections.push(replica);
    const replicaCaughtUp = async () => {
      const [[position]] = await primary.query<mysql.RowDataPacket[]>('SELECT @@gtid_binlog_pos AS gtid');
      const [[waited]] = await replicaRoot.query<mysql.RowDataPacket[]>('SELECT MASTER_GTID_WAIT(?, 60) AS result', [position!.gtid]);
      if (waited!.result !== 0) throw new Error('the replica did not catch up with the primary within 60 s');
    };

    const mailDir = path.join(dir, 'mail');
    const smtpPort = await freePort();
    const smtp = startOwned('smtp-stand-in', 'node', [path.join(root, 'scripts/lib/smtp-stand-in.mjs')], { env: { ...process.env, SMTP_PORT: String(smtpPort), MAIL_DIR: mailDir } });
    owned.push(smtp);
    await waitFor(() => /listening/.test(smtp.recentOutput()), { what: 'SMTP stand-in', timeoutMs: 15_000 });

    const nginxPort = await freePort();
    const url = `http://127.0.0.1:${nginxPort}`;
    const shared: Record<string, string> = {
      DATABASE_URL: primaryUrl,
      DATABASE_REPLICA_URLS: replicaUrl,
      PUBLIC_URL: url,
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(smtpPort),
      ...s3StandInEnv(),
      // Release files pass through nginx, as with a CDN in front (README).
      S3_PRESIGNED_URL_SECONDS: '0',
      JWT_SECRET: randomBytes(32).toString('base64url'),
      SIGNING_KEY_SECRET: randomBytes(32).toString('base64url'),
      // Background work polls often, so the journey does not wait on timers.
      MAIL_POLL_INTERVAL_MS: '500',
      RENDITION_POLL_INTERVAL_MS: '500',
      RELEASE_POLL_INTERVAL_MS: '500',
      TRANSLATION_NOTICE_INTERVAL_MS: '1000',
      // The seeded demo kiosk is not playing here; no silence alarms about it mid-journey.
      FLEET_WATCH_INTERVAL_MS: '0',
    };
    const envOf = (name: string, port?: number) => {
      const env: Record<string, string | undefined> = { ...process.env, ...shared, DATA_DIR: path.join(dir, name), MAIL_DIR: undefined };
      if (port) env.PORT = String(port);
      return env;
    };
    for (const command of ['migrate', 'seed']) {
      const result = run('node', ['server/dist/cli.js', command], { cwd: root, env: envOf('cli'), quiet: true });
      if (result.status !== 0) throw new Error(`${command} failed: ${(result.stderr || result.stdout).trim()}`);
    }

    const instances: Instance[] = [];
    for (const name of ['instance-a', 'instance-b']) {
      const port = await freePort();
      const server = startOwned(name, 'node', ['server/dist/main.js'], { cwd: root, env: envOf(name, port) });
      owned.push(server);
      instances.push({ name, port, process: server });
    }
    for (const { name, port, process: server } of instances) {
      await waitFor(async () => (await fetch(`http://127.0.0.1:${port}/api/health`)).ok, {
        what: name, timeoutMs: 90_000,
        failIf: () => (server.child.exitCode !== null ? `${name} exited: ${server.recentOutput().trim().split('\n').slice(-8).join('\n')}` : null),
      });
    }

    owned.push(await startNginx({ dir, port: nginxPort, upstreams: instances.map((instance) => instance.port) }));
    return { url, instances, mailDir, primary, replica, replicaCaughtUp, stop };
  } catch (error) {
    await stop();
    throw error;
  }
}
