import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { getModelToken } from '@nestjs/sequelize';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { PasswordResetRequest } from '../src/auth/models/password-reset-request.model.js';
import { PasswordResetsService } from '../src/auth/password-resets.service.js';
import { SilentKioskWatcher } from '../src/fleet/silent-kiosk.watcher.js';
import { BackgroundJobs } from '../src/jobs/background-jobs.service.js';
import { JobClaims } from '../src/jobs/job-claims.service.js';
import { JobOwner } from '../src/jobs/job-owner.js';
import { JobLease } from '../src/jobs/models/job-lease.model.js';
import { MailOutboxWorker } from '../src/mail/mail-outbox.worker.js';
import { MailService } from '../src/mail/mail.service.js';
import { OutboxMessage } from '../src/mail/models/outbox-message.model.js';
import { MediaAsset } from '../src/media/models/media-asset.model.js';
import { RENDITION_CLAIM_MS, RenditionsWorker } from '../src/media/renditions.worker.js';
import { ReleaseBuilder } from '../src/releases/release-builder.js';
import { ReleasesWorker } from '../src/releases/releases.worker.js';
import { capturedMailTo, discardUnsentMail, mailDir } from './mail-helpers.js';
import { prepareRenditions } from './media-fixtures.js';
import { approvedGallery } from './release-fixtures.js';
import { reviewVenue } from './review-fixtures.js';
import { createPerson, createTestApp, TestClock, uniqueEmail, type TestApp } from './test-app.js';
import { memberAt } from './venue-fixtures.js';

// Two instances of the app on one database, as behind a load balancer; one clock, so a test can let a claim run out.
const clock = new TestClock();
const mediaDir = fs.mkdtempSync(path.join(os.tmpdir(), 'mantlepiece-jobs-'));
let one: TestApp;
let two: TestApp;

beforeAll(async () => {
  const env = { MEDIA_DIR: mediaDir };
  one = await createTestApp({ clock, env });
  two = await createTestApp({ clock, env });
});
afterAll(async () => {
  await one?.close();
  await two?.close();
  fs.rmSync(mediaDir, { recursive: true, force: true });
});

const outboxOf = (t: TestApp) => t.app.get<typeof OutboxMessage>(getModelToken(OutboxMessage));

/** Messages to new addresses, queued as any feature queues them. */
async function queueMail(count: number): Promise<{ id: number; recipient: string }[]> {
  const mail = one.app.get(MailService);
  const queued = [];
  for (let i = 0; i < count; i += 1) {
    const recipient = uniqueEmail(`jobs-${i}`);
    queued.push(await mail.enqueue(recipient, 'en', { kind: 'password-reset', name: 'Ama Mensah', link: mail.studioLink('/reset-password/x'), expiresAt: clock.fromNow(3_600_000) }));
  }
  return queued.map(({ id, recipient }) => ({ id, recipient }));
}

/** Runs `pass` on both instances, several times each, all at once. */
async function inParallel<T>(pass: (t: TestApp) => Promise<T>, rounds = 3): Promise<T[]> {
  return Promise.all(Array.from({ length: rounds }, () => [pass(one), pass(two)]).flat());
}

describe('background jobs on two instances', () => {
  it('sends each outbox message exactly once when both instances poll at the same time', async () => {
    mailDir();
    await discardUnsentMail(one.app);
    const queued = await queueMail(30);
    const reports = await inParallel((t) => t.app.get(MailOutboxWorker).deliverDue());
    const sent = reports.flatMap((report) => report.sent);
    expect(sent.filter((id) => queued.some((message) => message.id === id)).sort((a, b) => a - b)).toEqual(queued.map((message) => message.id));
    // Both instances took part: the claims split the batch rather than one waiting for the other.
    expect(reports.filter((report) => report.sent.length > 0).length).toBeGreaterThan(1);
    for (const { recipient } of queued) expect(await capturedMailTo(recipient)).toHaveLength(1);
  }, 60_000);

  it('mails one reset link per queued request when both instances work the queue at once', async () => {
    const people = await Promise.all(Array.from({ length: 12 }, () => createPerson(one, { roles: ['curator'] })));
    const requests = one.app.get<typeof PasswordResetRequest>(getModelToken(PasswordResetRequest));
    await requests.bulkCreate(people.map((person) => ({ email: person.email, clientAddress: '2001:db8:5e55::7' })));
    await inParallel((t) => t.app.get(PasswordResetsService).mailRequestedLinks());
    for (const person of people) {
      expect(await outboxOf(one).count({ where: { recipient: person.email } }), person.email).toBe(1);
    }
  }, 60_000);

  it('builds each queued release once when both instances look for builds at once', async () => {
    const g = await approvedGallery(one, 'jobs-two-builds');
    const asked: number[] = [];
    for (let i = 0; i < 2; i += 1) {
      asked.push((await request(one.http).post(`/api/galleries/${g.gallery.id}/releases`).set(g.technician.auth).send({}).expect(202)).body.id as number);
    }
    const builds = [one, two].map((t) => vi.spyOn(t.app.get(ReleaseBuilder), 'build'));
    await inParallel((t) => t.app.get(ReleasesWorker).buildQueued(), 2);
    const built = builds.flatMap((spy) => spy.mock.calls.map(([release]) => release.id)).filter((id) => asked.includes(id));
    expect(built.sort((a, b) => a - b)).toEqual(asked);
    for (const id of asked) expect((await request(one.http).get(`/api/releases/${id}`).set(g.technician.auth)).body).toMatchObject({ state: 'ready' });
    for (const spy of builds) spy.mockRestore();
  }, 120_000);

  it('lets another instance take over a message whose instance died holding it, once the claim has run out', async () => {
    mailDir();
    await discardUnsentMail(one.app);
    const [message] = await queueMail(1);
    // Instance one claims the message and dies before sending it: nothing settles the claim.
    const dying = one.app.get(JobClaims).queue(OutboxMessage, 60_000);
    expect((await dying.claim({ id: message!.id }, { order: [['id', 'ASC']], limit: 1 })).map((row) => row.id)).toEqual([message!.id]);
    expect((await two.app.get(MailOutboxWorker).deliverDue()).sent).not.toContain(message!.id);

    clock.advance(60_001);
    expect((await two.app.get(MailOutboxWorker).deliverDue()).sent).toEqual([message!.id]);
    // The dead instance's late outcome is refused: the row is no longer its to settle.
    expect(await dying.settle(message!.id, { lastError: 'late' })).toBe(false);
    expect(await outboxOf(one).findByPk(message!.id)).toMatchObject({ lastError: null, claimedBy: null, sentAt: expect.any(Date) });
    expect(await capturedMailTo(message!.recipient)).toHaveLength(1);
  }, 60_000);

  it('makes each uploaded image\'s renditions once when both instances work the queue at once', async () => {
    const curator = await memberAt(one, (await reviewVenue(one, 'queued-renditions')).venue.id, ['curator']);
    const ids: number[] = [];
    for (let i = 0; i < 4; i += 1) ids.push((await request(one.http).post('/api/media').set(curator.headers).attach('file', await newPicture(), `queued-${i}.png`).expect(201)).body[0].id);
    const assets = one.app.get<typeof MediaAsset>(getModelToken(MediaAsset));
    const claimed: number[] = [];
    // Images other suites left pending are worked off too, so the rounds go on until this test's are done.
    while ((await assets.count({ where: { id: ids, renditionState: 'pending' } })) > 0) {
      claimed.push(...(await inParallel((t) => t.app.get(RenditionsWorker).makePending(), 2)).flat());
    }
    expect(claimed.filter((id) => ids.includes(id)).sort((a, b) => a - b)).toEqual(ids);
    for (const id of ids) expect((await request(two.http).get(`/api/media/${id}`).set(curator.headers)).body.renditionStatus).toEqual({ state: 'ready', progress: 1, failure: null });
  }, 120_000);

  it('takes over an image whose instance died while making its renditions, once the claim has run out', async () => {
    const curator = await memberAt(one, (await reviewVenue(one, 'orphaned-renditions')).venue.id, ['curator']);
    const { id } = (await request(one.http).post('/api/media').set(curator.headers).attach('file', await newPicture(), 'orphaned.png').expect(201)).body[0];
    const assets = one.app.get<typeof MediaAsset>(getModelToken(MediaAsset));
    await one.app.get(JobClaims).queue(MediaAsset, RENDITION_CLAIM_MS).claim({ id }, { order: [['id', 'ASC']], limit: 1 });
    expect(await assets.findByPk(id)).toMatchObject({ renditionState: 'pending', claimedBy: one.app.get(JobOwner).id });
    clock.advance(RENDITION_CLAIM_MS + 1);
    expect(await prepareRenditions(two, id)).toBe('ready');
    expect(await assets.findByPk(id)).toMatchObject({ claimedBy: null, claimExpiresAt: null });
  }, 60_000);

  it('refuses a release while an image it shows is still preparing or failed, naming the image', async () => {
    const g = await approvedGallery(one, 'jobs-unprepared');
    const assets = one.app.get<typeof MediaAsset>(getModelToken(MediaAsset));
    const ask = () => request(two.http).post(`/api/galleries/${g.gallery.id}/releases`).set(g.technician.auth).send({});
    await assets.update({ renditionState: 'pending', renditionProgress: 0.5 }, { where: { id: g.imageId } });
    const preparing = await ask();
    expect(preparing.status).toBe(422);
    expect(preparing.body.errors).toContainEqual({ path: ['media', g.imageId], message: 'The image “plate-map.png” is still preparing; ask for the release once its renditions are made.' });
    await assets.update({ renditionState: 'failed', renditionFailure: 'The WebP renditions could not be made: the disk is full' }, { where: { id: g.imageId } });
    expect((await ask()).body.errors).toContainEqual({ path: ['media', g.imageId], message: expect.stringMatching(/^The renditions of the image “plate-map.png” failed \(.*the disk is full\); retry them/) });
    await assets.update({ renditionState: 'ready', renditionProgress: 1, renditionFailure: null }, { where: { id: g.imageId } });
    expect((await ask()).status).toBe(202);
  }, 120_000);

  it('lets one instance at a time judge the fleet, and another take over once the holder\'s lease has run out', async () => {
    await one.app.get<typeof JobLease>(getModelToken(JobLease)).destroy({ where: { name: 'fleet-watch' } });
    const checks = [one, two].map((t) => vi.spyOn(t.app.get(SilentKioskWatcher), 'check').mockResolvedValue({ silent: [], back: [] }));
    try {
      await inParallel((t) => t.app.get(BackgroundJobs).runNow('fleet-watch'));
      const judged = checks.map((spy) => spy.mock.calls.length);
      expect(judged.filter((calls) => calls > 0)).toHaveLength(1);
      const [holder, other] = judged[0]! > 0 ? [0, 1] : [1, 0];
      const instances = [one, two];

      // The holder dies without giving the lease back: nobody else judges until the lease has run out, then another does.
      await instances[other]!.app.get(BackgroundJobs).runNow('fleet-watch');
      expect(checks[other]!.mock.calls).toHaveLength(0);
      clock.advance(60_001);
      await instances[other]!.app.get(BackgroundJobs).runNow('fleet-watch');
      expect(checks[other]!.mock.calls).toHaveLength(1);
      const before = checks[holder]!.mock.calls.length;
      await instances[holder]!.app.get(BackgroundJobs).runNow('fleet-watch');
      expect(checks[holder]!.mock.calls).toHaveLength(before);
    } finally {
      for (const spy of checks) spy.mockRestore();
    }
  });
});

/** A picture no other test has uploaded (its colour is random), so the upload is a new image. */
const newPicture = () => {
  const background = { r: Math.floor(Math.random() * 256), g: Math.floor(Math.random() * 256), b: Math.floor(Math.random() * 256) };
  return sharp({ create: { width: 700, height: 400, channels: 3, background } }).png().toBuffer();
};
