import { randomBytes } from 'node:crypto';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Test } from '@nestjs/testing';
import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import type { Role, SessionView } from '@mantlepiece/shared';
import { AppModule } from '../src/app.module.js';
import { PasswordResetsService } from '../src/auth/password-resets.service.js';
import { initApp } from '../src/app.setup.js';
import { Clock } from '../src/clock/clock.service.js';
import { OutboxMessage } from '../src/mail/models/outbox-message.model.js';
import { User } from '../src/users/models/user.model.js';
import { PasswordHasher } from '../src/users/password-hasher.js';

/** A clock that stands still until a test moves it. */
export class TestClock extends Clock {
  private current = new Date();

  override now(): Date {
    return new Date(this.current);
  }

  advance(ms: number): void {
    this.current = new Date(this.current.getTime() + ms);
  }
}

export interface TestApp {
  app: NestExpressApplication;
  http: ReturnType<NestExpressApplication['getHttpServer']>;
  clock: TestClock;
  close(): Promise<void>;
}

/** The whole app, configured as main.ts does, on the suites' database; `env` overrides settings. */
export async function createTestApp(options: { env?: Record<string, string>; clock?: TestClock } = {}): Promise<TestApp> {
  const clock = options.clock ?? new TestClock();
  const saved = Object.fromEntries(Object.keys(options.env ?? {}).map((key) => [key, process.env[key]]));
  Object.assign(process.env, options.env);
  try {
    const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).overrideProvider(Clock).useValue(clock).compile();
    const app = moduleRef.createNestApplication<NestExpressApplication>({ logger: ['error'] });
    await initApp(app);
    return { app, http: app.getHttpServer(), clock, close: () => app.close() };
  } finally {
    for (const [key, value] of Object.entries(saved)) {
      if (value === undefined) delete process.env[key];
      else process.env[key] = value;
    }
  }
}

export const TEST_PASSWORD = 'correct horse battery staple';

/** A unique address per call, so suites never collide in the shared database. */
export const uniqueEmail = (label: string) => `${label}-${randomBytes(5).toString('hex')}@suite.test`;

export async function createPerson(
  { app }: TestApp,
  fields: { roles: Role[]; locales?: string[]; name?: string; email?: string; active?: boolean; uiLanguage?: string },
): Promise<User> {
  const users = app.get<typeof User>(getModelToken(User));
  const passwordHash = await app.get(PasswordHasher).hash(TEST_PASSWORD);
  return users.create({
    email: fields.email ?? uniqueEmail(fields.roles.join('-') || 'nobody'),
    name: fields.name ?? 'Suite Person',
    passwordHash,
    roles: fields.roles,
    locales: fields.locales ?? [],
    uiLanguage: fields.uiLanguage ?? 'en',
    active: fields.active ?? true,
  });
}

export interface SignedIn {
  session: SessionView;
  accessToken: string;
  /** The `mp_refresh=...` pair, ready for a Cookie header. */
  refreshCookie: string;
}

/**
 * Where the suites' sign-ins come from (IPv6 documentation prefix, through the loopback proxy hop):
 * not loopback, so the limits that a suite's deliberate failures trip on loopback never lock
 * another suite out.
 */
export const SUITE_ADDRESS = { 'X-Forwarded-For': '2001:db8:5e55::1' };

export async function signIn({ http }: TestApp, email: string, password = TEST_PASSWORD): Promise<SignedIn> {
  const res = await request(http).post('/api/auth/login').set(SUITE_ADDRESS).send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in of ${email} expected 200, got ${res.status} ${JSON.stringify(res.body)}`);
  return { session: res.body, accessToken: res.body.accessToken, refreshCookie: refreshCookieOf(res) };
}

export function refreshCookieOf(res: request.Response): string {
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  const cookie = cookies.find((c) => c.startsWith('mp_refresh='));
  if (!cookie) throw new Error(`expected an mp_refresh cookie, got ${JSON.stringify(cookies)}`);
  return cookie.split(';')[0];
}

export const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

/** The link token in the newest queued mail to `email` (tokens exist only there: the database keeps hashes). */
export async function linkTokenMailedTo({ app }: TestApp, email: string, page: 'invitation' | 'reset-password'): Promise<string> {
  // Reset requests are queued; their worker's timer is off in the suites.
  if (page === 'reset-password') await app.get(PasswordResetsService).mailRequestedLinks();
  const outbox = app.get<typeof OutboxMessage>(getModelToken(OutboxMessage));
  const message = await outbox.findOne({ where: { recipient: email }, order: [['id', 'DESC']] });
  const token = message?.textBody.match(new RegExp(`/${page}/([A-Za-z0-9_-]+)`))?.[1];
  if (!token) throw new Error(`expected a ${page} link in mail to ${email}, found ${message ? message.textBody : 'no mail'}`);
  return token;
}
