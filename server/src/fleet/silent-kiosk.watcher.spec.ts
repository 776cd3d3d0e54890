import { getModelToken } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { capturedMailTo, mailDir } from '../../test/mail-helpers.js';
import { galleryWithExhibit } from '../../test/authoring-fixtures.js';
import { pairedKiosk } from '../../test/release-fixtures.js';
import { member } from '../../test/review-fixtures.js';
import { createTestApp } from '../../test/test-app.js';
import { Kiosk } from '../kiosks/models/kiosk.model.js';
import { MailOutboxWorker } from '../mail/mail-outbox.worker.js';
import { SilentKioskWatcher } from './silent-kiosk.watcher.js';

const t = await createTestApp();
afterAll(() => t.close());

const admin = await member(t, ['admin']);
const technician = await member(t, ['technician'], { name: 'Tomás Reyes' });
const frenchTechnician = await member(t, ['technician'], { name: 'Élise Marchand', uiLanguage: 'fr' });
const { gallery } = await galleryWithExhibit(t, admin.auth, 'watch');
const watcher = t.app.get(SilentKioskWatcher);

/** Runs the outbox as its timer would, until nothing is due. */
async function deliverAll(): Promise<void> {
  while ((await t.app.get(MailOutboxWorker).deliverDue()).sent.length) { /* next batch */ }
}

const mailAbout = async (email: string, station: string) => (await capturedMailTo(email)).filter((mail) => mail.subject?.includes(station));

describe('silent-kiosk watcher', () => {
  it('mails the technicians once when a kiosk goes silent past the threshold and once when it is back, however often it checks', async () => {
    mailDir();
    const { station, credential, device } = await pairedKiosk(t, admin.auth, technician.auth, gallery.id);
    // The suites share one database: the kiosks other suites left count as announced for good, so
    // this check mails about this suite's kiosk alone.
    await t.app.get<typeof Kiosk>(getModelToken(Kiosk)).update({ silenceAlertedAt: new Date('9999-12-31T00:00:00Z') }, { where: { id: { [Op.ne]: credential.kioskId } } });
    const beat = () => request(t.http).post('/api/kiosk/heartbeat').set(device).send({ releaseId: null, appVersion: '0.1.0', uptimeS: 5, storageUsedBytes: null, lastError: null });
    expect((await beat()).status).toBe(204);
    const lastHeartbeat = t.clock.now();

    t.clock.advance(299_000);
    expect((await watcher.check()).silent).not.toContain(credential.kioskId);
    t.clock.advance(1_000);
    expect((await watcher.check()).silent).toContain(credential.kioskId);
    for (let again = 0; again < 3; again += 1) {
      t.clock.advance(15_000);
      expect((await watcher.check()).silent).not.toContain(credential.kioskId);
    }
    expect((await beat()).status).toBe(204);
    expect((await watcher.check()).back).toContain(credential.kioskId);
    for (let again = 0; again < 3; again += 1) {
      t.clock.advance(15_000);
      expect((await watcher.check()).back).not.toContain(credential.kioskId);
    }
    await deliverAll();
    const mail = await mailAbout(technician.person.email, station.name);
    expect(mail.map((m) => m.subject).sort()).toEqual([`Kiosk back: ${station.name}, ${gallery.name}`, `Kiosk silent: ${station.name}, ${gallery.name}`]);
    const silent = mail.find((m) => m.subject?.startsWith('Kiosk silent'))!;
    expect(silent.text).toContain('Hello Tomás Reyes,');
    expect(silent.text).toContain(`has sent no heartbeat since ${new Intl.DateTimeFormat('en', { dateStyle: 'long', timeStyle: 'short', timeZone: 'UTC' }).format(lastHeartbeat)} UTC`);
    expect(silent.text).toMatch(new RegExp(`/fleet/${credential.kioskId}\\n`));
    expect((await mailAbout(frenchTechnician.person.email, station.name)).map((m) => m.subject).sort()).toEqual([
      `Borne de retour : ${station.name}, ${gallery.name}`, `Borne muette : ${station.name}, ${gallery.name}`,
    ]);

    // A second silence is a new episode, told once again.
    t.clock.advance(300_000);
    expect((await watcher.check()).silent).toContain(credential.kioskId);
    expect((await watcher.check()).silent).not.toContain(credential.kioskId);
  }, 90_000);
});
