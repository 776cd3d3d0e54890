import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { PasswordResetsService } from '../auth/password-resets.service.js';
import { MailOutboxWorker } from '../mail/mail-outbox.worker.js';
import { discardUnsentMail } from '../../test/mail-helpers.js';
import { bearer, createPerson, createTestApp, signIn, SUITE_ADDRESS } from '../../test/test-app.js';

const t = await createTestApp();
await discardUnsentMail(t.app);
afterAll(() => t.close());
const admin = await createPerson(t, { roles: ['admin'] });
const { accessToken } = await signIn(t, admin.email);

describe('captured mail (development)', () => {
  it('lists the stand-in’s messages, newest first, and shows one with its text and HTML', async () => {
    const person = await createPerson(t, { roles: ['curator'], name: 'Oskar Lind' });
    await request(t.http).post('/api/auth/password-reset').set(SUITE_ADDRESS).send({ email: person.email });
    await t.app.get(PasswordResetsService).mailRequestedLinks();
    await t.app.get(MailOutboxWorker).deliverDue();

    const list = await request(t.http).get('/api/dev/mail?pageSize=100').set(bearer(accessToken));
    expect(list.status).toBe(200);
    const summary = list.body.items.find((m: { to: string }) => m.to === person.email);
    expect(summary).toEqual({ id: expect.any(String), to: person.email, subject: 'Reset your Mantlepiece password', date: expect.any(String) });
    const ids = list.body.items.map((m: { id: string }) => m.id);
    expect(ids).toEqual([...ids].sort().reverse());

    const one = await request(t.http).get(`/api/dev/mail/${summary.id}`).set(bearer(accessToken));
    expect(one.body).toMatchObject({ id: summary.id, to: person.email, from: expect.stringContaining('Mantlepiece') });
    expect(one.body.text).toMatch(/\/reset-password\/[A-Za-z0-9_-]{43}/);
    expect(one.body.html).toContain('<p>Hello Oskar Lind,</p>');
  });

  it('answers 404 for a name that is not a message file, such as a path out of the folder', async () => {
    for (const id of ['..%2Fdb-password', 'no-such-message']) {
      expect((await request(t.http).get(`/api/dev/mail/${id}`).set(bearer(accessToken))).status).toBe(404);
    }
  });

  it('answers 404 in production, where no stand-in keeps mail', async () => {
    const production = await createTestApp({ env: { NODE_ENV: 'production', SIGNING_KEY_SECRET: 'production-signing-secret' } });
    try {
      const token = (await signIn(production, admin.email)).accessToken;
      expect((await request(production.http).get('/api/dev/mail').set(bearer(token))).status).toBe(404);
    } finally {
      await production.close();
    }
  });
});
