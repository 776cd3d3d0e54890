import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TestApp } from '../../test/test-app.js';
import { createTranslationTestApp, translationWorld } from '../../test/translation-fixtures.js';
import { OutboxMessage } from '../mail/models/outbox-message.model.js';
import { STALE_DIGEST_QUIET_MS, TranslationNoticesJob } from './translation-notices.job.js';

let t: TestApp;
let world: Awaited<ReturnType<typeof translationWorld>>;
let job: TranslationNoticesJob;

const mailTo = async (email: string) =>
  (await t.app.get<typeof OutboxMessage>(getModelToken(OutboxMessage)).findAll({ where: { recipient: email }, order: [['id', 'ASC']] }))
    .map((message) => ({ subject: message.subject, text: message.textBody }));

beforeAll(async () => {
  t = await createTranslationTestApp();
  world = await translationWorld(t, 'notices');
  job = t.app.get(TranslationNoticesJob);
});
afterAll(() => t?.close());

describe('translator assignment mail', () => {
  it('tells a translator once about each locale an admin gives them', async () => {
    const email = world.translatorPerson.email;
    await job.announceAssignments();
    expect(await mailTo(email)).toEqual([expect.objectContaining({ subject: 'You now translate into French' })]);
    await job.announceAssignments();
    expect(await mailTo(email)).toHaveLength(1);

    await request(t.http).patch(`/api/users/${world.translatorPerson.id}`).set(world.admin).send({ locales: ['fr', 'es'] }).expect(200);
    await job.announceAssignments();
    const mail = await mailTo(email);
    expect(mail).toHaveLength(2);
    expect(mail[1]).toMatchObject({ subject: 'You now translate into Spanish' });
    expect(mail[1]!.text).toContain('/translations');
  });
});

describe('digest of newly stale units', () => {
  it('waits until the source has rested, then mails each translator of the locale once per change', async () => {
    const email = world.translatorPerson.email;
    const unitId = `p${world.second.id}.paragraph.1`;
    await request(t.http).put(`/api/stories/${world.story.id}/translations/fr/units/${unitId}`).set(world.translator)
      .send({ text: 'Le fond marin s’enfonce en refroidissant.', version: 0 }).expect(200);
    // The translator works at every venue, and the suites share one database: what other suites left
    // stale long enough ago goes out first, so the counts below are about this story's changes.
    await job.sendStaleDigests();
    const sent = (await mailTo(email)).length;
    const edit = (text: string, version: number) =>
      request(t.http).put(`/api/panels/${world.second.id}`).set(world.curator)
        .send({ doc: { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] }, version }).expect(200);
    await edit('The sea floor sinks as it cools and ages.', world.second.version);

    await job.sendStaleDigests();
    expect(await mailTo(email)).toHaveLength(sent);

    t.clock.advance(STALE_DIGEST_QUIET_MS + 60_000);
    await job.sendStaleDigests();
    const digest = (await mailTo(email)).slice(sent);
    expect(digest).toEqual([expect.objectContaining({ subject: 'Source text changed under your translations' })]);
    expect(digest[0]!.text).toContain(`• ${world.story.title} (French): 1`);

    await job.sendStaleDigests();
    expect(await mailTo(email)).toHaveLength(sent + 1);

    await edit('Old sea floor is cold and deep.', world.second.version + 1);
    t.clock.advance(STALE_DIGEST_QUIET_MS + 60_000);
    await job.sendStaleDigests();
    expect(await mailTo(email)).toHaveLength(sent + 2);
  });
});
