import mysql from 'mysql2/promise';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FRESH_READS_COOKIE } from '../src/database/replica-reads.js';
import { migrate } from '../src/database/migrator.js';
import { bearer, createPerson, createTestApp, signIn, SUITE_ADDRESS, type TestApp } from './test-app.js';

// Reads from a replica (issue 15, point 4) against a real MariaDB primary and a replica following it
// with MariaDB's built-in replication, both started by `node scripts/test.mjs` (scripts/lib/mariadb.mjs).
// The replica is held still (STOP SLAVE) to show where each read came from: a row written since then
// exists on the primary only.
const primaryUrl = process.env.REPLICATION_STAND_IN_PRIMARY_URL;
const replicaUrl = process.env.REPLICATION_STAND_IN_REPLICA_URL;
const replicaSocket = process.env.REPLICATION_STAND_IN_REPLICA_SOCKET;
if (!primaryUrl || !replicaUrl || !replicaSocket) throw new Error('REPLICATION_STAND_IN_* is not set: run this suite through `node scripts/test.mjs server`, which starts a primary and a replica');

let app: TestApp;
let replicaRoot: mysql.Connection;
let primary: mysql.Connection;
let token: string;

/** Waits until the replica has applied everything the primary has written so far. */
async function replicaCaughtUp() {
  const [[position]] = await primary.query<mysql.RowDataPacket[]>('SELECT @@gtid_binlog_pos AS gtid');
  const [[waited]] = await replicaRoot.query<mysql.RowDataPacket[]>('SELECT MASTER_GTID_WAIT(?, 30) AS result', [position!.gtid]);
  expect(waited!.result, 'the replica caught up with the primary').toBe(0);
}

const venueNamed = (slug: string) => ({ name: `Replica hall ${slug}`, slug, sourceLocale: 'en', targetLocales: [] });
const listedSlugs = async (cookie?: string) => {
  const call = request(app.http).get('/api/venues?pageSize=100').set(bearer(token));
  const res = await (cookie ? call.set('Cookie', cookie) : call);
  expect(res.status).toBe(200);
  return (res.body.items as { slug: string }[]).map((venue) => venue.slug);
};

beforeAll(async () => {
  await migrate(primaryUrl);
  primary = await mysql.createConnection(primaryUrl);
  replicaRoot = await mysql.createConnection({ socketPath: replicaSocket, user: 'root' });
  app = await createTestApp({ env: { DATABASE_URL: primaryUrl, DATABASE_REPLICA_URLS: replicaUrl } });
  const admin = await createPerson(app, { roles: ['admin'] });
  token = (await signIn(app, admin.email)).accessToken;
  await replicaCaughtUp();
  await replicaRoot.query('STOP SLAVE');
});

afterAll(async () => {
  await replicaRoot?.query('START SLAVE');
  await app?.close();
  await primary?.end();
  await replicaRoot?.end();
});

describe('reads with a replica', () => {
  const slug = `replica-${Date.now().toString(36)}`;
  let freshReads = '';

  it('a write goes to the primary and marks its client for fresh reads', async () => {
    const res = await request(app.http).post('/api/venues').set(SUITE_ADDRESS).set(bearer(token)).send(venueNamed(slug));
    expect(res.status).toBe(201);
    const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((each) => each.startsWith(`${FRESH_READS_COOKIE}=`));
    expect(cookie, 'the fresh-reads cookie').toMatch(/Max-Age=10;.*HttpOnly.*SameSite=Strict/);
    freshReads = cookie!.split(';')[0]!;
    const [rows] = await primary.query<mysql.RowDataPacket[]>('SELECT id FROM venues WHERE slug = ?', [slug]);
    expect(rows).toHaveLength(1);
  });

  it("a client's read after its own write comes from the primary and shows what it wrote", async () => {
    expect(await listedSlugs(freshReads)).toContain(slug);
  });

  it('a read that may lag comes from the replica, which has not seen the write yet', async () => {
    expect(await listedSlugs()).not.toContain(slug);
  });

  it('a request that writes reads from the primary: it finds the row the replica lacks', async () => {
    const [[venue]] = await primary.query<mysql.RowDataPacket[]>('SELECT id FROM venues WHERE slug = ?', [slug]);
    const res = await request(app.http).patch(`/api/venues/${venue!.id}`).set(SUITE_ADDRESS).set(bearer(token)).send({ name: `Renamed ${slug}` });
    expect(res.status).toBe(200);
    expect(res.body.name).toBe(`Renamed ${slug}`);
  });

  it('once the replica follows again, every reader sees the write', async () => {
    await replicaRoot.query('START SLAVE');
    await replicaCaughtUp();
    expect(await listedSlugs()).toContain(slug);
  });
});
