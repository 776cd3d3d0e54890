import { getModelToken } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PASSWORD_PROBLEMS } from '@mantlepiece/shared';
import { PasswordResetRequest } from '../src/auth/models/password-reset-request.model.js';
import {
  bearer, createPerson, createTestApp, linkTokenMailedTo, refreshCookieOf, signIn, uniqueEmail, type SignedIn, type TestApp,
} from './test-app.js';

let t: TestApp;

beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** Each test's requests come from an address of their own (RFC 5737), so no limit of another test gets in the way. */
let lastAddress = 0;
const fromOwnAddress = () => ({ 'X-Forwarded-For': `192.0.2.${(lastAddress += 1)}` });

const me = (session: Pick<SignedIn, 'accessToken'>) => request(t.http).get('/api/auth/me').set(bearer(session.accessToken));
const refresh = (cookie: string) => request(t.http).post('/api/auth/refresh').set('Cookie', cookie);
const requestReset = (email: string) => request(t.http).post('/api/auth/password-reset').set(fromOwnAddress()).send({ email });
const completeReset = (token: string, password: string) => request(t.http).post('/api/auth/password-reset/complete').send({ token, password });

describe('ending a session ends its access tokens at once', () => {
  it('sign-out ends that session, and only that one', async () => {
    const person = await createPerson(t, { roles: ['curator'] });
    const laptop = await signIn(t, person.email);
    const tablet = await signIn(t, person.email);
    expect((await request(t.http).post('/api/auth/logout').set('Cookie', laptop.refreshCookie)).status).toBe(204);
    expect((await me(laptop)).status).toBe(401);
    expect((await me(tablet)).status).toBe(200);
  });

  it('a password reset ends every session of the account', async () => {
    const person = await createPerson(t, { roles: ['educator'] });
    const sessions = [await signIn(t, person.email), await signIn(t, person.email)];
    await requestReset(person.email);
    expect((await completeReset(await linkTokenMailedTo(t, person.email, 'reset-password'), 'a fresh and private phrase')).status).toBe(204);
    for (const session of sessions) {
      expect((await me(session)).status).toBe(401);
      expect((await refresh(session.refreshCookie)).status).toBe(401);
    }
  });

  it('deactivation ends every session, and activating the account again does not revive them', async () => {
    const admin = await signIn(t, (await createPerson(t, { roles: ['admin'] })).email);
    const person = await createPerson(t, { roles: ['translator'] });
    const session = await signIn(t, person.email);
    const setActive = (active: boolean) => request(t.http).patch(`/api/users/${person.id}`).set(bearer(admin.accessToken)).send({ active });
    expect((await setActive(false)).status).toBe(200);
    expect((await me(session)).status).toBe(401);
    expect((await setActive(true)).status).toBe(200);
    expect((await me(session)).status).toBe(401);
    expect((await refresh(session.refreshCookie)).status).toBe(401);
    expect((await me(await signIn(t, person.email))).status).toBe(200);
  });

  it('a refresh token presented again after the grace window ends its session, the newest access token included', async () => {
    const person = await createPerson(t, { roles: ['technician'] });
    const session = await signIn(t, person.email);
    const rotated = await refresh(session.refreshCookie);
    expect(rotated.status).toBe(200);
    t.clock.advance(10_000);
    expect((await refresh(session.refreshCookie)).status).toBe(401);
    expect((await me(rotated.body)).status).toBe(401);
    expect((await refresh(refreshCookieOf(rotated))).status).toBe(401);
  });
});

describe('two tabs refreshing at once', () => {
  it('get the same new pair from one refresh token within ten seconds, and the session goes on', async () => {
    const person = await createPerson(t, { roles: ['curator'] });
    const session = await signIn(t, person.email);
    const [first, second] = await Promise.all([refresh(session.refreshCookie), refresh(session.refreshCookie)]);
    expect([first.status, second.status]).toEqual([200, 200]);
    expect(second.body.accessToken).toBe(first.body.accessToken);
    expect(refreshCookieOf(second)).toBe(refreshCookieOf(first));

    t.clock.advance(9_000);
    const late = await refresh(session.refreshCookie);
    expect(late.status).toBe(200);
    expect(refreshCookieOf(late)).toBe(refreshCookieOf(first));
    expect((await me(first.body)).status).toBe(200);
    expect((await refresh(refreshCookieOf(first))).status).toBe(200);
  });
});

describe('password reset links', () => {
  it('a new link voids the older one; the newest works once', async () => {
    const person = await createPerson(t, { roles: ['curator'] });
    await requestReset(person.email);
    const older = await linkTokenMailedTo(t, person.email, 'reset-password');
    await requestReset(person.email);
    const newer = await linkTokenMailedTo(t, person.email, 'reset-password');
    expect(newer).not.toBe(older);
    expect((await completeReset(older, 'a fresh and private phrase')).status).toBe(410);
    expect((await completeReset(newer, 'a fresh and private phrase')).status).toBe(204);
    expect((await completeReset(newer, 'yet another private phrase')).status).toBe(410);
  });

  it('answers a request for a known and an unknown address with the same database work, and queues both', async () => {
    const sequelize = t.app.get(Sequelize);
    const statementsOf = async (email: string) => {
      const statements: string[] = [];
      const logging = sequelize.options.logging;
      sequelize.options.logging = (sql: string) => statements.push(sql);
      try {
        expect((await requestReset(email)).status).toBe(202);
      } finally {
        sequelize.options.logging = logging;
      }
      // The statements' shape: values, connection ids and the subjects themselves left out.
      return statements.map((sql) => sql.replace(/^Executing \([^)]*\): /, '').replace(/'(?:[^'\\]|\\.)*'/g, '?').replace(/\b\d+\b/g, '?'));
    };
    const known = await statementsOf((await createPerson(t, { roles: ['curator'] })).email);
    const unknown = await statementsOf(uniqueEmail('nobody-here'));
    expect(known.length).toBeGreaterThan(0);
    expect(unknown).toEqual(known);
    expect(known.join('\n')).not.toMatch(/FROM `users`/);

    const queued = t.app.get<typeof PasswordResetRequest>(getModelToken(PasswordResetRequest));
    expect(await queued.count({ where: { processedAt: null } })).toBeGreaterThanOrEqual(2);
  });
});

describe('new passwords (NIST SP 800-63B)', () => {
  const cases: [string, string][] = [
    ['elevenchars', PASSWORD_PROBLEMS.tooShort],
    [' '.repeat(16), PASSWORD_PROBLEMS.onlySpaces],
    ['1qaz2wsx3edc', PASSWORD_PROBLEMS.common],
    ['QwErTy123456', PASSWORD_PROBLEMS.common],
  ];

  it.each(cases)('refuses %j at reset completion with 400 naming the field and why', async (password, message) => {
    const person = await createPerson(t, { roles: ['curator'] });
    await requestReset(person.email);
    const res = await completeReset(await linkTokenMailedTo(t, person.email, 'reset-password'), password);
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ path: ['password'], message }]);
  });

  it('refuses a common password when an invitation is accepted, and takes twelve characters of any kind, emoji counted as one each', async () => {
    const admin = await signIn(t, (await createPerson(t, { roles: ['admin'] })).email);
    const email = uniqueEmail('invitee');
    await request(t.http).post('/api/users/invitations').set(bearer(admin.accessToken)).send({ email, name: 'Ada Invitee', roles: ['curator'], locales: [] });
    const token = await linkTokenMailedTo(t, email, 'invitation');
    const accept = (password: string) => request(t.http).post('/api/auth/invitations/accept').send({ token, name: 'Ada Invitee', password });
    const common = await accept('qwerty123456');
    expect(common.status).toBe(400);
    expect(common.body.errors).toEqual([{ path: ['password'], message: PASSWORD_PROBLEMS.common }]);
    expect((await accept('🌋🌋🌋🌋🌋🌋 ')).body.errors).toEqual([{ path: ['password'], message: PASSWORD_PROBLEMS.tooShort }]);
    expect((await accept('  basalt  and  magma  ')).status).toBe(200);
  });
});
