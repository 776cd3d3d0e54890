import { randomInt } from 'node:crypto';
import { getModelToken } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { MediaView, PreflightEntry, TranslationUnitView } from '@mantlepiece/shared';
import { PasswordResetsService } from '../src/auth/password-resets.service.js';
import { up as canonicaliseStoredTags } from '../src/database/migrations/0820-canonical-language-tags.js';
import { OutboxMessage } from '../src/mail/models/outbox-message.model.js';
import { User } from '../src/users/models/user.model.js';
import { createPerson, type TestApp } from './test-app.js';
import { createTranslationTestApp, translationWorld } from './translation-fixtures.js';

// Language tags: canonical BCP 47 form as Intl.getCanonicalLocales gives it (ECMA-402 §6.2.3),
// and RFC 4647 §3.4 lookup, which truncates a tag from the right (en-GB → en) to find text.
let t: TestApp;
let world: Awaited<ReturnType<typeof translationWorld>>;

beforeAll(async () => {
  t = await createTranslationTestApp();
  world = await translationWorld(t, 'tags');
});
afterAll(() => t?.close());

const media = async (id: number): Promise<MediaView> => (await request(t.http).get(`/api/media/${id}`).set(world.curator).expect(200)).body;

describe('tags through the API', () => {
  it('stores a translator’s pt-br as pt-BR, and it matches the venue’s pt-BR', async () => {
    const venue = await request(t.http).patch(`/api/venues/${world.venue.id}`).set(world.admin).send({ targetLocales: ['fr', 'es', 'pt-BR'] }).expect(200);
    expect(venue.body.targetLocales).toEqual(['fr', 'es', 'pt-BR']);
    const person = await request(t.http).patch(`/api/users/${world.translatorPerson.id}`).set(world.admin).send({ locales: ['pt-br'] });
    expect({ status: person.status, locales: person.body.locales }).toEqual({ status: 200, locales: ['pt-BR'] });

    const units = await request(t.http).get(`/api/stories/${world.story.id}/translations/pt-br/units`).set(world.translator);
    expect(units.status).toBe(200);
    const worklist = await request(t.http).get(`/api/translations/stories?q=${encodeURIComponent(world.story.title)}`).set(world.translator).expect(200);
    expect(worklist.body.items.map((item: { locale: string }) => item.locale)).toEqual(['pt-BR']);
  });

  it('keys alt text by canonical tags, and refuses two keys of one language naming the field', async () => {
    const saved = await request(t.http).patch(`/api/media/${world.image.id}`).set(world.curator).send({ alt: { 'pt-br': 'Basalto escuro numa dorsal.' } }).expect(200);
    expect(saved.body.alt).toMatchObject({ 'pt-BR': 'Basalto escuro numa dorsal.' });
    expect(Object.keys(saved.body.alt)).not.toContain('pt-br');

    const twice = await request(t.http).patch(`/api/media/${world.image.id}`).set(world.curator).send({ alt: { en: 'Dark basalt.', EN: 'Basalt.' } });
    expect(twice.status).toBe(400);
    expect(twice.body.errors).toEqual([{ path: ['alt'], message: expect.stringContaining('are the same language (en)') }]);
  });
});

describe('lookup where text is chosen by language', () => {
  it('passes preflight for a story written in en-GB whose image has alt text only in en, and translates that alt text', async () => {
    const story = await request(t.http).patch(`/api/stories/${world.story.id}`).set(world.curator).send({ sourceLocale: 'en-gb' }).expect(200);
    expect(story.body.sourceLocale).toBe('en-GB');
    const image = await media(world.image.id);
    expect(image.alt.en).toBe('Dark basalt on a ridge.');
    expect(image.alt['en-GB']).toBeUndefined();

    const preflight: PreflightEntry[] = (await request(t.http).get(`/api/stories/${world.story.id}/preflight`).set(world.curator).expect(200)).body;
    const altChecks = preflight.filter((entry) => entry.check === 'image-alt-text');
    expect(altChecks.length).toBeGreaterThan(0);
    expect(altChecks.every((entry) => entry.passed), JSON.stringify(altChecks)).toBe(true);

    const units: TranslationUnitView[] = (await request(t.http).get(`/api/stories/${world.story.id}/translations/fr/units`).set(world.admin).expect(200)).body.items;
    expect(units.find((unit) => unit.kind === 'altText')?.source).toBe('Dark basalt on a ridge.');
  });

  it('tells the image page which languages the image needs: its venue’s and its stories’', async () => {
    const image = await media(world.image.id);
    expect(image.altLocales).toEqual(expect.arrayContaining(['en', 'fr', 'es', 'pt-BR', 'en-GB']));
  });

  it('mails a person whose language is en-GB in English and one whose language is fr-CA in French', async () => {
    const outbox = t.app.get<typeof OutboxMessage>(getModelToken(OutboxMessage));
    for (const [uiLanguage, subject] of [['en-GB', 'Reset your Mantlepiece password'], ['fr-CA', 'Réinitialisez votre mot de passe Mantlepiece']]) {
      const person = await createPerson(t, { roles: ['curator'] });
      // Stored as an older version or another client may have left it: the API itself offers en, fr, es and ar.
      await t.app.get<typeof User>(getModelToken(User)).update({ uiLanguage }, { where: { id: person.id } });
      const address = `203.0.113.${randomInt(1, 255)}`;
      await request(t.http).post('/api/auth/password-reset').set('X-Forwarded-For', address).send({ email: person.email }).expect(202);
      // Reset requests are queued; their worker's timer is off in the suites.
      await t.app.get(PasswordResetsService).mailRequestedLinks();
      const message = await outbox.findOne({ where: { recipient: person.email } });
      expect(message?.subject, `mail for ${uiLanguage}`).toBe(subject);
    }
  });
});

describe('migration 0820', () => {
  it('canonicalises tags stored before the API did, keeps the newer of two rows that become one, and changes nothing a second time', async () => {
    const db = t.app.get(Sequelize);
    const query = (sql: string, replacements: Record<string, unknown> = {}) => db.query(sql, { replacements });
    const imageId = world.image.id;
    const userId = world.translatorPerson.id;
    // As an older server wrote them: lower-case regions, an old alias beside its preferred tag.
    await query(`UPDATE users SET locales = :locales, ui_language = 'EN-gb' WHERE id = :userId`, { locales: JSON.stringify(['pt-br', 'PT-BR', 'fr']), userId });
    await query(`UPDATE stories SET source_locale = 'en-gb' WHERE id = :id`, { id: world.story.id });
    await query(`DELETE FROM media_alt_texts WHERE media_asset_id = :imageId AND locale IN ('iw', 'he', 'zh-hant')`, { imageId });
    await query(
      `INSERT INTO media_alt_texts (media_asset_id, locale, text, created_at, updated_at) VALUES
        (:imageId, 'iw', 'older, under the old alias', '2024-01-01', '2024-01-01'),
        (:imageId, 'he', 'newer, under the preferred tag', '2025-01-01', '2025-01-01'),
        (:imageId, 'zh-hant', 'traditional Chinese', '2025-01-01', '2025-01-01')`,
      { imageId },
    );

    const qi = db.getQueryInterface();
    await canonicaliseStoredTags(qi);
    const state = async () => ({
      user: ((await query('SELECT locales, ui_language AS uiLanguage FROM users WHERE id = :userId', { userId }))[0] as { locales: string | string[]; uiLanguage: string }[])[0],
      story: ((await query('SELECT source_locale AS sourceLocale FROM stories WHERE id = :id', { id: world.story.id }))[0] as { sourceLocale: string }[])[0],
      alt: ((await query(`SELECT locale COLLATE utf8mb4_bin AS locale, text FROM media_alt_texts WHERE media_asset_id = :imageId AND locale IN ('he', 'zh-Hant') ORDER BY locale`, { imageId }))[0]),
    });
    const first = await state();
    const locales = typeof first.user!.locales === 'string' ? JSON.parse(first.user!.locales) : first.user!.locales;
    expect({ locales, uiLanguage: first.user!.uiLanguage, sourceLocale: first.story!.sourceLocale }).toEqual({ locales: ['pt-BR', 'fr'], uiLanguage: 'en-GB', sourceLocale: 'en-GB' });
    // iw is the deprecated code of Hebrew, replaced by he (IANA Language Subtag Registry, "Preferred-Value: he").
    expect(first.alt).toEqual([{ locale: 'he', text: 'newer, under the preferred tag' }, { locale: 'zh-Hant', text: 'traditional Chinese' }]);

    await canonicaliseStoredTags(qi);
    expect(await state()).toEqual(first);
  });
});
