import { getModelToken } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { galleryWithExhibit } from '../../test/authoring-fixtures.js';
import { pairedKiosk } from '../../test/release-fixtures.js';
import { member } from '../../test/review-fixtures.js';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { memberAt } from '../../test/venue-fixtures.js';
import { Kiosk } from '../kiosks/models/kiosk.model.js';
import { OutboxMessage } from '../mail/models/outbox-message.model.js';
import { SilentKioskWatcher } from './silent-kiosk.watcher.js';

const t = await createTestApp();
/** The same server started again, on the same database and clock; closed last, as closing an app ends the models' connection. */
let restarted: TestApp | undefined;
afterAll(async () => {
  await restarted?.close();
  await t.close();
});

const admin = await member(t, ['admin']);
const technician = await member(t, ['technician'], { name: 'Tomás Reyes' });
const frenchTechnician = await member(t, ['technician'], { name: 'Élise Marchand', uiLanguage: 'fr' });
const { venue, gallery } = await galleryWithExhibit(t, admin.auth, 'watch');
const watcher = t.app.get(SilentKioskWatcher);

/** The suites share one database: the kiosks others left count as announced for good, so a check mails about this suite's kiosks alone. */
const setAsideKiosksBut = (kioskIds: number[]) =>
  t.app.get<typeof Kiosk>(getModelToken(Kiosk)).update({ silenceAlertedAt: new Date('9999-12-31T00:00:00Z') }, { where: { id: { [Op.notIn]: kioskIds } } });

/**
 * The mail the watcher wrote to the outbox for one address about one station. Sending it is the
 * outbox worker's job (mail-outbox.worker.spec); running the worker here would send every suite's
 * waiting mail, since the suites share one database and this one moves its clock far ahead.
 */
const mailAbout = async (email: string, station: string) =>
  (await t.app.get<typeof OutboxMessage>(getModelToken(OutboxMessage)).findAll({ where: { recipient: email }, order: [['id', 'ASC']] }))
    .filter((mail) => mail.subject.includes(station))
    .map((mail) => ({ subject: mail.subject, text: mail.textBody }));

describe('silent-kiosk watcher', () => {
  it('mails the technicians once when a kiosk goes silent past the threshold and once when it is back, however often it checks', async () => {
    const { station, credential, device } = await pairedKiosk(t, admin.auth, technician.auth, gallery.id);
    await setAsideKiosksBut([credential.kioskId]);
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

  it('judges silence only once an offline threshold has passed since the server started, so a restart mails no silent and back pair', async () => {
    const playing = await pairedKiosk(t, admin.auth, technician.auth, gallery.id);
    const unplugged = await pairedKiosk(t, admin.auth, technician.auth, gallery.id);
    await setAsideKiosksBut([playing.credential.kioskId, unplugged.credential.kioskId]);
    const beat = (device: Record<string, string>, app = t) =>
      request(app.http).post('/api/kiosk/heartbeat').set(device).send({ releaseId: null, appVersion: '0.1.0', uptimeS: 5, storageUsedBytes: null, lastError: null });
    expect((await beat(playing.device)).status).toBe(204);
    expect((await beat(unplugged.device)).status).toBe(204);

    // The server is down for ten minutes (twice the 300 s threshold), then starts again on the same database.
    t.clock.advance(600_000);
    restarted = await createTestApp({ clock: t.clock });
    const restartedWatcher = restarted.app.get(SilentKioskWatcher);
    expect(await restartedWatcher.check()).toEqual({ silent: [], back: [] });
    t.clock.advance(30_000);
    expect((await beat(playing.device, restarted)).status).toBe(204);
    t.clock.advance(269_000);
    expect((await restartedWatcher.check()).silent).toEqual([]);
    // One threshold after the start: the kiosk that played throughout is not silent; the one that never reported again is.
    t.clock.advance(1_000);
    expect(await restartedWatcher.check()).toEqual({ silent: [unplugged.credential.kioskId], back: [] });
    expect(await mailAbout(technician.person.email, playing.station.name)).toEqual([]);
    expect((await mailAbout(technician.person.email, unplugged.station.name)).map((m) => m.subject)).toEqual([`Kiosk silent: ${unplugged.station.name}, ${gallery.name}`]);
  }, 90_000);

  it('mails the technicians of the kiosk’s venue, not those of another venue', async () => {
    // Signed in afresh: the clock has moved on past the suite's first sign-ins.
    const keeper = await member(t, ['admin']);
    const orgTechnician = await member(t, ['technician']);
    const here = await memberAt(t, venue.id, ['technician']);
    const elsewhere = await memberAt(t, (await galleryWithExhibit(t, keeper.auth, 'watch-elsewhere')).venue.id, ['technician']);
    const { station, credential } = await pairedKiosk(t, keeper.auth, orgTechnician.auth, gallery.id);
    await setAsideKiosksBut([credential.kioskId]);
    t.clock.advance(300_000);
    expect((await watcher.check()).silent).toEqual([credential.kioskId]);
    const silent = `Kiosk silent: ${station.name}, ${gallery.name}`;
    expect((await mailAbout(here.user.email, station.name)).map((m) => m.subject)).toEqual([silent]);
    expect((await mailAbout(orgTechnician.person.email, station.name)).map((m) => m.subject)).toEqual([silent]);
    expect(await mailAbout(elsewhere.user.email, station.name)).toEqual([]);
  }, 90_000);
});
