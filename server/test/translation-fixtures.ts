import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { getModelToken } from '@nestjs/sequelize';
import sharp from 'sharp';
import request from 'supertest';
import { examplePanelDoc, type PanelDocJSON, type PanelNodeJSON } from '@mantlepiece/shared';
import { MediaAltText } from '../src/media/models/media-alt-text.model.js';
import { Translation } from '../src/translations/models/translation.model.js';
import { galleryWithExhibit, paragraphDoc, signedInAs } from './authoring-fixtures.js';
import { prepareRenditions } from './media-fixtures.js';
import { bearer, createPerson, createTestApp, signIn, type TestApp } from './test-app.js';

/** The app with a media folder of its own, removed on close. */
export async function createTranslationTestApp(): Promise<TestApp> {
  const mediaDir = fs.mkdtempSync(path.join(os.tmpdir(), 'mantlepiece-translations-'));
  const t = await createTestApp({ env: { MEDIA_DIR: mediaDir } });
  return { ...t, close: async () => {
    await t.close();
    fs.rmSync(mediaDir, { recursive: true, force: true });
  } };
}

/** The shared example panel (every node and mark), showing an image of the library. */
export function examplePanelWithImage(mediaId: number): PanelDocJSON {
  const doc = examplePanelDoc();
  for (const node of doc.content as PanelNodeJSON[]) if (node.type === 'panelImage') node.attrs = { mediaId: String(mediaId) };
  return doc;
}

/**
 * A venue translated into French and Spanish, a story of two panels (the example panel with an
 * image whose alt text is written in English, and one plain paragraph), and a translator of French.
 */
export async function translationWorld(t: TestApp, label: string) {
  const admin = await signedInAs(t, 'admin');
  const curator = await signedInAs(t, 'curator');
  const { venue, exhibit } = await galleryWithExhibit(t, admin, label);
  await request(t.http).patch(`/api/venues/${venue.id}`).set(admin).send({ targetLocales: ['fr', 'es'] }).expect(200);

  // A colour no other suite uses, so the upload is a new asset rather than a shared one.
  const background = { r: Math.floor(Math.random() * 256), g: Math.floor(Math.random() * 256), b: Math.floor(Math.random() * 256) };
  const png = await sharp({ create: { width: 64, height: 48, channels: 3, background } }).png().toBuffer();
  const [image] = (await request(t.http).post('/api/media').set(curator).field('venueId', String(venue.id)).attach('file', png, 'ridge.png').expect(201)).body;
  await prepareRenditions(t, image.id);
  await request(t.http).patch(`/api/media/${image.id}`).set(curator).send({ alt: { en: 'Dark basalt on a ridge.' } }).expect(200);

  const story = (await request(t.http).post('/api/stories').set(curator).send({ title: `${label} story`, exhibitId: exhibit.id }).expect(201)).body;
  const panel = (await request(t.http).post(`/api/stories/${story.id}/panels`).set(curator).send({ doc: examplePanelWithImage(image.id) }).expect(201)).body;
  const second = (await request(t.http).post(`/api/stories/${story.id}/panels`).set(curator).send({ doc: paragraphDoc('The sea floor sinks as it cools.') }).expect(201)).body;

  const translatorPerson = await createPerson(t, { roles: ['translator'], locales: ['fr'] });
  const translator = bearer((await signIn(t, translatorPerson.email)).accessToken);
  return { admin, curator, translator, translatorPerson, venue, story, panel, second, image };
}

/** Rows of the tables a translation write touches, to show a refusal changed nothing. */
export async function translationRowCounts(t: TestApp) {
  const translations = t.app.get<typeof Translation>(getModelToken(Translation));
  const altTexts = t.app.get<typeof MediaAltText>(getModelToken(MediaAltText));
  return { translations: await translations.count(), altTexts: await altTexts.count(), versions: await translations.sum('version') };
}
