import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { closedPort, capturedMailTo, discardUnsentMail, mailDir } from '../../test/mail-helpers.js';
import { bearer, createPerson, createTestApp, signIn, TestClock, uniqueEmail, type TestApp } from '../../test/test-app.js';
import { MailOutboxWorker, retryDelayMs } from './mail-outbox.worker.js';
import { OutboxMessage } from './models/outbox-message.model.js';

async function inviteSomeone(t: TestApp, uiLanguage: 'en' | 'fr') {
  const admin = await createPerson(t, { roles: ['admin'], name: 'Hana Kobayashi' });
  const { accessToken } = await signIn(t, admin.email);
  const email = uniqueEmail('mail');
  const res = await request(t.http).post('/api/users/invitations').set(bearer(accessToken))
    .send({ email, name: 'Lucía Ortega', roles: ['educator'], locales: [], uiLanguage });
  expect(res.status).toBe(201);
  const outbox = t.app.get<typeof OutboxMessage>(getModelToken(OutboxMessage));
  return { email, message: (await outbox.findOne({ where: { recipient: email } }))! };
}

describe('mail outbox', () => {
  it('keeps a message while SMTP is down and sends it, as an invitation with a studio link, once SMTP is back', async () => {
    mailDir();
    const clock = new TestClock();
    const down = await createTestApp({ clock, env: { SMTP_PORT: String(await closedPort()) } });
    await discardUnsentMail(down.app);
    const { email, message } = await inviteSomeone(down, 'en');
    try {
      const worker = down.app.get(MailOutboxWorker);
      expect((await worker.deliverDue()).failed).toContain(message.id);
      await message.reload();
      expect(message).toMatchObject({ attempts: 1, sentAt: null, claimedBy: null, claimExpiresAt: null, lastError: expect.stringMatching(/ECONNREFUSED/) });
      expect(message.nextAttemptAt).toEqual(new Date(clock.now().getTime() + retryDelayMs(1)));
      // Not due again until the back-off has passed.
      expect((await worker.deliverDue()).failed).not.toContain(message.id);
    } finally {
      await down.close();
    }

    clock.advance(retryDelayMs(1));
    const up = await createTestApp({ clock });
    try {
      expect((await up.app.get(MailOutboxWorker).deliverDue()).sent).toContain(message.id);
      await message.reload();
      expect(message).toMatchObject({ attempts: 2, sentAt: clock.now(), lastError: null });
    } finally {
      await up.close();
    }

    const [mail, ...more] = await capturedMailTo(email);
    expect(more).toEqual([]);
    expect(mail!.subject).toBe('You are invited to Mantlepiece');
    expect(mail!.text).toContain('Hello Lucía Ortega,');
    expect(mail!.text).toContain('Hana Kobayashi has invited you');
    expect(mail!.text).toMatch(new RegExp(`${process.env.PUBLIC_URL ?? 'http://127.0.0.1:4310'}/invitation/[A-Za-z0-9_-]{43}\\n`));
    expect(mail!.html).toMatch(/<a href="[^"]+\/invitation\/[A-Za-z0-9_-]{43}">/);
  });

  it('writes the invitation in the language chosen for the recipient', async () => {
    const t = await createTestApp();
    await discardUnsentMail(t.app);
    try {
      const { email, message } = await inviteSomeone(t, 'fr');
      expect((await t.app.get(MailOutboxWorker).deliverDue()).sent).toContain(message.id);
      const [mail] = await capturedMailTo(email);
      expect(mail!.subject).toBe('Vous êtes invité·e sur Mantlepiece');
      expect(mail!.text).toContain('Bonjour Lucía Ortega,');
    } finally {
      await t.close();
    }
  });
});

describe('retryDelayMs', () => {
  it('doubles from 30 seconds and stops growing at an hour', () => {
    expect([1, 2, 3, 4, 7, 8, 50].map(retryDelayMs)).toEqual([30_000, 60_000, 120_000, 240_000, 1_920_000, 3_600_000, 3_600_000]);
  });
});
