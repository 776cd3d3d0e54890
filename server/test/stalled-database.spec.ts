import net from 'node:net';
import { createConnection, type Connection } from 'mysql2/promise';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { DatabaseError } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from '../src/database/database-unavailable.js';
import { bearer, createPerson, createTestApp, signIn, type TestApp } from './test-app.js';

/**
 * A loopback relay in front of the suites' real MariaDB that can stop passing bytes either way: to
 * the app, that is a database server that was stopped (SIGSTOP) or a network that went quiet,
 * while every other suite's connection to the same MariaDB goes on untouched.
 */
class StallingRelay {
  private stalled = false;
  private readonly held: Array<() => void> = [];
  private readonly sockets = new Set<net.Socket>();
  private readonly server: net.Server;

  constructor(target: URL) {
    this.server = net.createServer((client) => {
      const upstream = net.connect(Number(target.port || 3306), target.hostname);
      for (const [from, to] of [[client, upstream], [upstream, client]] as const) {
        this.sockets.add(from);
        from.on('data', (chunk) => {
          const pass = () => to.destroyed || to.write(chunk);
          if (this.stalled) this.held.push(pass);
          else pass();
        });
        from.on('close', () => { this.sockets.delete(from); to.destroy(); });
        from.on('error', () => to.destroy());
      }
    });
  }

  async listen(): Promise<number> {
    await new Promise<void>((resolve) => this.server.listen(0, '127.0.0.1', resolve));
    return (this.server.address() as net.AddressInfo).port;
  }

  stall(): void {
    this.stalled = true;
  }

  resume(): void {
    this.stalled = false;
    for (const pass of this.held.splice(0)) pass();
  }

  async close(): Promise<void> {
    this.resume();
    for (const socket of this.sockets) socket.destroy();
    await new Promise((resolve) => this.server.close(resolve));
  }
}

const databaseUrl = new URL(process.env.DATABASE_URL!);
const relay = new StallingRelay(databaseUrl);
let t: TestApp;
let token: string;

beforeAll(async () => {
  const relayed = new URL(databaseUrl);
  relayed.hostname = '127.0.0.1';
  relayed.port = String(await relay.listen());
  // Short bounds keep the suite quick; the defaults (README, Settings) are a few seconds each.
  t = await createTestApp({
    env: { DATABASE_URL: relayed.href, DB_CONNECT_TIMEOUT_MS: '1000', DB_ACQUIRE_TIMEOUT_MS: '1000', DB_STATEMENT_TIMEOUT_MS: '1000' },
  });
  const person = await createPerson(t, { roles: ['curator'] });
  token = (await signIn(t, person.email)).accessToken;
});

afterAll(async () => {
  await t?.close();
  await relay.close();
});

/** Recovery is a state, not a delay: health says up again once the database answers. */
async function untilHealthy(): Promise<void> {
  await vi.waitFor(async () => expect((await request(t.http).get('/api/health')).status).toBe(200), { timeout: 20_000, interval: 200 });
}

function expectUnavailable(res: request.Response): void {
  expect({ status: res.status, retryAfter: res.headers['retry-after'], body: res.body })
    .toEqual({ status: 503, retryAfter: '5', body: { statusCode: 503, message: DATABASE_UNAVAILABLE_MESSAGE } });
}

describe('a database that does not answer', () => {
  it('makes GET /api/health answer 503 {db: down} within 2 s, and 200 {db: up} once it answers again', async () => {
    expect((await request(t.http).get('/api/health')).body).toEqual({ status: 'ok', db: 'up' });
    relay.stall();
    try {
      const res = await request(t.http).get('/api/health').timeout(2000);
      expect({ status: res.status, retryAfter: res.headers['retry-after'], body: res.body })
        .toEqual({ status: 503, retryAfter: '5', body: { status: 'error', db: 'down' } });
    } finally {
      relay.resume();
    }
    await untilHealthy();
    expect((await request(t.http).get('/api/health')).body).toEqual({ status: 'ok', db: 'up' });
  });

  it('answers API requests with 503, Retry-After and the error body, more of them at once than the pool holds, then serves them again', async () => {
    relay.stall();
    try {
      // More than the pool's ten connections: some wait for a connection that never opens, the rest for a free one.
      const answers = await Promise.all(Array.from({ length: 12 }, () => request(t.http).get('/api/auth/me').set(bearer(token)).timeout(15_000)));
      for (const res of answers) expectUnavailable(res);
    } finally {
      relay.resume();
    }
    await untilHealthy();
    const res = await request(t.http).get('/api/auth/me').set(bearer(token));
    expect(res.status).toBe(200);
  });

  it('gives up on a statement already sent on an open connection, and does not hand that connection out again', async () => {
    const sequelize = t.app.get(Sequelize);
    await sequelize.query('SELECT 1');
    relay.stall();
    try {
      const error = await sequelize.query('SELECT 1').catch((caught: unknown) => caught);
      expect({ unavailable: isDatabaseUnavailable(error), code: ((error as DatabaseError).parent as Error & { code?: string } | undefined)?.code })
        .toEqual({ unavailable: true, code: 'PROTOCOL_SEQUENCE_TIMEOUT' });
    } finally {
      relay.resume();
    }
    await expect(sequelize.query('SELECT 1', { plain: true })).resolves.toEqual({ 1: 1 });
  });
});

describe('a statement that waits on a lock', () => {
  let holder: Connection;

  beforeAll(async () => {
    holder = await createConnection(databaseUrl.href);
  });

  afterAll(async () => {
    await holder?.end();
  });

  it('is stopped by the statement limit with a 503 while health stays up, and the same pool serves once the lock goes', async () => {
    await holder.query('LOCK TABLES users WRITE');
    try {
      expectUnavailable(await request(t.http).get('/api/auth/me').set(bearer(token)).timeout(15_000));
      // The database itself answers: a load balancer keeps the instance.
      expect((await request(t.http).get('/api/health')).body).toEqual({ status: 'ok', db: 'up' });
    } finally {
      await holder.query('UNLOCK TABLES');
    }
    const res = await request(t.http).get('/api/auth/me').set(bearer(token));
    expect(res.status).toBe(200);
  });
});
