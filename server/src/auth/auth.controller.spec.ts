import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../audit/models/audit-event.model.js';
import {
  bearer, createPerson, createTestApp, linkTokenMailedTo, refreshCookieOf, signIn, TEST_PASSWORD, uniqueEmail, type TestApp,
} from '../../test/test-app.js';

const SIGN_IN_REQUIRED = 'Sign in to continue.';
let t: TestApp;

beforeAll(async () => {
  t = await createTestApp({ env: { SIGN_IN_MAX_FAILURES_PER_ADDRESS: '8' } });
});
afterAll(() => t.close());

/** Failures are also counted per client address, so tests that fail on purpose come from their own. */
let nextAddress = 1;
const fromOwnAddress = () => ({ 'X-Forwarded-For': `198.51.100.${nextAddress++}` });

const login = (email: string, password: string, headers: Record<string, string> = fromOwnAddress()) =>
  request(t.http).post('/api/auth/login').set(headers).send({ email, password });

const auditActions = async (targetId: number | string) =>
  (await t.app.get<typeof AuditEvent>(getModelToken(AuditEvent)).findAll({ where: { targetId: String(targetId) } })).map((e) => e.action);

describe('POST /api/auth/login', () => {
  it('signs in with the right password: a session body and an httpOnly, SameSite=Strict refresh cookie on /api/auth', async () => {
    const person = await createPerson(t, { roles: ['curator'] });
    const res = await login(person.email, TEST_PASSWORD);
    expect(res.status).toBe(200);
    expect(res.body.accessToken).toEqual(expect.any(String));
    expect(res.body.user).toMatchObject({ id: person.id, email: person.email, roles: ['curator'], active: true });
    expect(res.body.user.lastSignInAt).toEqual(t.clock.now().toISOString());
    expect(JSON.stringify(res.body)).not.toMatch(/hash/i);
    const cookie = ([] as string[]).concat(res.headers['set-cookie']).find((c) => c.startsWith('mp_refresh='))!;
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Strict/);
    expect(cookie).toMatch(/Path=\/api\/auth(;|$)/);
    expect(await auditActions(person.id)).toContain('auth.signed-in');
  });

  it('answers a wrong password, an unknown address and a deactivated account with the same 401 message', async () => {
    const person = await createPerson(t, { roles: ['educator'] });
    const inactive = await createPerson(t, { roles: ['educator'], active: false });
    const answers = await Promise.all([
      login(person.email, 'not the password at all'),
      login(uniqueEmail('nobody'), TEST_PASSWORD),
      login(inactive.email, TEST_PASSWORD),
    ]);
    for (const res of answers) {
      expect(res.status).toBe(401);
      expect(res.body).toEqual({ statusCode: 401, message: 'Email or password is incorrect.' });
    }
  });

  it('finds the address whatever its letter case', async () => {
    const person = await createPerson(t, { roles: ['translator'] });
    expect((await login(person.email.toUpperCase(), TEST_PASSWORD)).status).toBe(200);
  });

  it('refuses an address with 429 after five failures for one account from it, even with the right password, records it, and lets the owner in from elsewhere', async () => {
    const person = await createPerson(t, { roles: ['technician'] });
    const address = fromOwnAddress();
    for (let i = 0; i < 5; i += 1) expect((await login(person.email, `wrong password ${i}`, address)).status).toBe(401);
    const locked = await login(person.email, TEST_PASSWORD, address);
    expect(locked.status).toBe(429);
    expect(locked.body).toEqual({ statusCode: 429, message: expect.stringMatching(/Too many failed sign-ins/) });
    expect(Number(locked.headers['retry-after'])).toBeGreaterThan(0);
    expect(await auditActions(person.email)).toContain('auth.sign-in-locked');
    expect((await login(person.email, TEST_PASSWORD)).status).toBe(200);

    t.clock.advance(15 * 60_000 + 1);
    expect((await login(person.email, TEST_PASSWORD, address)).status).toBe(200);
  });

  it('refuses with 429 after repeated failures from one client address, whichever accounts they tried', async () => {
    const address = fromOwnAddress();
    for (let i = 0; i < 8; i += 1) expect((await login(uniqueEmail('guess'), 'guessed password', address)).status).toBe(401);
    const person = await createPerson(t, { roles: ['curator'] });
    expect((await login(person.email, TEST_PASSWORD, address)).status).toBe(429);
    expect((await login(person.email, TEST_PASSWORD)).status).toBe(200);
  }, 60_000);

  it('rejects a body without a password with 400 naming the field', async () => {
    const res = await request(t.http).post('/api/auth/login').send({ email: 'someone@suite.test' });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual(expect.arrayContaining([expect.objectContaining({ path: ['password'] })]));
  });
});

describe('POST /api/auth/refresh', () => {
  it('rotates the refresh cookie and gives a new access token', async () => {
    const person = await createPerson(t, { roles: ['curator'] });
    const first = await signIn(t, person.email);
    const res = await request(t.http).post('/api/auth/refresh').set('Cookie', first.refreshCookie);
    expect(res.status).toBe(200);
    expect(res.body.user.id).toBe(person.id);
    expect(refreshCookieOf(res)).not.toBe(first.refreshCookie);
    expect((await request(t.http).get('/api/auth/me').set(bearer(res.body.accessToken))).status).toBe(200);
  });

  it('revokes the whole family when a rotated token is presented again after the grace window', async () => {
    const person = await createPerson(t, { roles: ['curator'] });
    const first = await signIn(t, person.email);
    const rotated = await request(t.http).post('/api/auth/refresh').set('Cookie', first.refreshCookie);
    const next = refreshCookieOf(rotated);
    t.clock.advance(10_000);

    const replay = await request(t.http).post('/api/auth/refresh').set('Cookie', first.refreshCookie);
    expect(replay.status).toBe(401);
    expect((await request(t.http).post('/api/auth/refresh').set('Cookie', next)).status).toBe(401);
    expect(await auditActions(person.id)).toContain('auth.refresh-token-reused');
  });

  it('answers 204 without a cookie (nobody signed in), 401 with an unknown one and once the token has expired', async () => {
    const nobody = await request(t.http).post('/api/auth/refresh');
    expect([nobody.status, nobody.text]).toEqual([204, '']);
    expect((await request(t.http).post('/api/auth/refresh').set('Cookie', 'mp_refresh=made-up')).status).toBe(401);
    const person = await createPerson(t, { roles: ['curator'] });
    const { refreshCookie } = await signIn(t, person.email);
    t.clock.advance(14 * 86_400_000 + 1);
    expect((await request(t.http).post('/api/auth/refresh').set('Cookie', refreshCookie)).status).toBe(401);
  });

  it('stops refreshing a deactivated account', async () => {
    const person = await createPerson(t, { roles: ['curator'] });
    const { refreshCookie } = await signIn(t, person.email);
    await person.update({ active: false });
    expect((await request(t.http).post('/api/auth/refresh').set('Cookie', refreshCookie)).status).toBe(401);
  });
});

describe('POST /api/auth/logout', () => {
  it('answers 204, clears the cookie and revokes the refresh token', async () => {
    const person = await createPerson(t, { roles: ['educator'] });
    const { refreshCookie } = await signIn(t, person.email);
    const res = await request(t.http).post('/api/auth/logout').set('Cookie', refreshCookie);
    expect(res.status).toBe(204);
    expect(([] as string[]).concat(res.headers['set-cookie'])).toEqual([expect.stringMatching(/^mp_refresh=;.*Expires=Thu, 01 Jan 1970/)]);
    expect((await request(t.http).post('/api/auth/refresh').set('Cookie', refreshCookie)).status).toBe(401);
  });
});

describe('GET and PATCH /api/auth/me', () => {
  it('shows the signed-in person and lets them change their name and UI language', async () => {
    const person = await createPerson(t, { roles: ['translator'], locales: ['fr'] });
    const { accessToken } = await signIn(t, person.email);
    const me = await request(t.http).get('/api/auth/me').set(bearer(accessToken));
    expect(me.status).toBe(200);
    expect(me.body).toMatchObject({ id: person.id, roles: ['translator'], locales: ['fr'], uiLanguage: 'en' });

    const patched = await request(t.http).patch('/api/auth/me').set(bearer(accessToken)).send({ name: 'Élodie Brun', uiLanguage: 'fr' });
    expect(patched.status).toBe(200);
    expect(patched.body).toMatchObject({ name: 'Élodie Brun', uiLanguage: 'fr' });
  });

  it('refuses a UI language we do not write, naming the field', async () => {
    const person = await createPerson(t, { roles: ['curator'] });
    const { accessToken } = await signIn(t, person.email);
    const res = await request(t.http).patch('/api/auth/me').set(bearer(accessToken)).send({ uiLanguage: 'tlh' });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([expect.objectContaining({ path: ['uiLanguage'] })]);
  });

  it('answers 401 without a token, with a forged one, with an expired one and for a deactivated account', async () => {
    const person = await createPerson(t, { roles: ['curator'] });
    const { accessToken } = await signIn(t, person.email);
    const [header, payload] = accessToken.split('.');
    const answers = [
      await request(t.http).get('/api/auth/me'),
      await request(t.http).get('/api/auth/me').set(bearer(`${header}.${payload}.forged-signature`)),
      await request(t.http).get('/api/auth/me').set('Authorization', accessToken),
    ];
    t.clock.advance(15 * 60_000 + 1);
    answers.push(await request(t.http).get('/api/auth/me').set(bearer(accessToken)));

    const other = await createPerson(t, { roles: ['curator'] });
    const otherToken = (await signIn(t, other.email)).accessToken;
    await other.update({ active: false });
    answers.push(await request(t.http).get('/api/auth/me').set(bearer(otherToken)));

    for (const res of answers) expect(res.body).toEqual({ statusCode: 401, message: SIGN_IN_REQUIRED });
  });
});

describe('invitations', () => {
  const invite = async (fields: Record<string, unknown> = {}) => {
    const admin = await createPerson(t, { roles: ['admin'], name: 'Priya Natarajan' });
    const { accessToken } = await signIn(t, admin.email);
    const email = uniqueEmail('invitee');
    const res = await request(t.http).post('/api/users/invitations').set(bearer(accessToken))
      .send({ email, name: 'Jonas Weber', roles: ['translator'], locales: ['fr', 'es'], ...fields });
    expect(res.status).toBe(201);
    return { email, invitation: res.body, token: await linkTokenMailedTo(t, email, 'invitation') };
  };

  it('shows a pending invitation and turns it into an account with the invited roles and locales, once', async () => {
    const { email, token } = await invite();
    const preview = await request(t.http).get(`/api/auth/invitations/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toEqual({ email, name: 'Jonas Weber', roles: ['translator'], locales: ['fr', 'es'], expiresAt: expect.any(String) });

    const accepted = await request(t.http).post('/api/auth/invitations/accept').send({ token, name: 'Jonas M. Weber', password: 'a long enough password' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.user).toMatchObject({ email, name: 'Jonas M. Weber', roles: ['translator'], locales: ['fr', 'es'] });
    expect(refreshCookieOf(accepted)).toMatch(/^mp_refresh=/);
    expect((await login(email, 'a long enough password')).status).toBe(200);

    const again = await request(t.http).post('/api/auth/invitations/accept').send({ token, name: 'Someone Else', password: 'another long password' });
    expect(again.status).toBe(410);
    expect((await request(t.http).get(`/api/auth/invitations/${token}`)).status).toBe(410);
  });

  it('answers 410 once the invitation has expired', async () => {
    const { token } = await invite();
    t.clock.advance(72 * 3_600_000 + 1);
    expect((await request(t.http).get(`/api/auth/invitations/${token}`)).status).toBe(410);
    const res = await request(t.http).post('/api/auth/invitations/accept').send({ token, name: 'Late Comer', password: 'a long enough password' });
    expect(res.status).toBe(410);
  });

  it('answers 404 for a link that never existed', async () => {
    const res = await request(t.http).get('/api/auth/invitations/never-issued-token');
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ statusCode: 404, message: 'This invitation link is not valid.' });
  });

  it('refuses a password shorter than 12 characters, naming the field', async () => {
    const { token } = await invite();
    const res = await request(t.http).post('/api/auth/invitations/accept').send({ token, name: 'Short Word', password: 'elevenchars' });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ path: ['password'], message: 'Use at least 12 characters.' }]);
  });
});

describe('password reset', () => {
  it('answers 202 for any address and mails a link only to an existing account', async () => {
    const person = await createPerson(t, { roles: ['curator'] });
    const unknown = uniqueEmail('stranger');
    expect((await request(t.http).post('/api/auth/password-reset').set(fromOwnAddress()).send({ email: person.email })).status).toBe(202);
    expect((await request(t.http).post('/api/auth/password-reset').set(fromOwnAddress()).send({ email: unknown })).status).toBe(202);
    await expect(linkTokenMailedTo(t, person.email, 'reset-password')).resolves.toEqual(expect.any(String));
    await expect(linkTokenMailedTo(t, unknown, 'reset-password')).rejects.toThrow(/no mail/);
  });

  it('sets the new password once, ends existing sessions, and refuses the used link with 410', async () => {
    const person = await createPerson(t, { roles: ['curator'] });
    const { refreshCookie } = await signIn(t, person.email);
    await request(t.http).post('/api/auth/password-reset').set(fromOwnAddress()).send({ email: person.email });
    const token = await linkTokenMailedTo(t, person.email, 'reset-password');

    const done = await request(t.http).post('/api/auth/password-reset/complete').send({ token, password: 'a brand new passphrase' });
    expect(done.status).toBe(204);
    expect((await login(person.email, 'a brand new passphrase')).status).toBe(200);
    expect((await login(person.email, TEST_PASSWORD)).status).toBe(401);
    expect((await request(t.http).post('/api/auth/refresh').set('Cookie', refreshCookie)).status).toBe(401);

    const again = await request(t.http).post('/api/auth/password-reset/complete').send({ token, password: 'yet another passphrase' });
    expect(again.status).toBe(410);
    expect(await auditActions(person.id)).toContain('auth.password-reset');
  });

  it('refuses an expired link with 410 and an unknown one with 404', async () => {
    const person = await createPerson(t, { roles: ['curator'] });
    await request(t.http).post('/api/auth/password-reset').set(fromOwnAddress()).send({ email: person.email });
    const token = await linkTokenMailedTo(t, person.email, 'reset-password');
    t.clock.advance(60 * 60_000 + 1);
    expect((await request(t.http).post('/api/auth/password-reset/complete').send({ token, password: 'a brand new passphrase' })).status).toBe(410);
    expect((await request(t.http).post('/api/auth/password-reset/complete').send({ token: 'never-issued', password: 'a brand new passphrase' })).status).toBe(404);
  });
});
