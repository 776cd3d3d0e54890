import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { getModelToken } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import sharp from 'sharp';
import request from 'supertest';
import type { PanelDocJSON, PanelNodeJSON, Role } from '@mantlepiece/shared';
import { MailOutboxWorker } from '../src/mail/mail-outbox.worker.js';
import { OutboxMessage } from '../src/mail/models/outbox-message.model.js';
import type { User } from '../src/users/models/user.model.js';
import { galleryWithExhibit, paragraphDoc, signedInAs } from './authoring-fixtures.js';
import { prepareRenditions } from './media-fixtures.js';
import { bearer, createPerson, createTestApp, signIn, type TestApp } from './test-app.js';

export type Headers = Record<string, string>;

export interface Member {
  person: User;
  auth: Headers;
}

/**
 * The app with a media folder of its own. On close the folder goes, and so does the mail the
 * suite queued but did not send (every submission notifies every educator), so the outbox of the
 * shared database does not hold up the suites after it.
 */
export async function createReviewApp(): Promise<TestApp> {
  const mediaDir = fs.mkdtempSync(path.join(os.tmpdir(), 'mantlepiece-review-'));
  const t = await createTestApp({ env: { MEDIA_DIR: mediaDir } });
  const outbox = t.app.get<typeof OutboxMessage>(getModelToken(OutboxMessage));
  const before = Number((await outbox.max('id')) ?? 0);
  const close = async () => {
    await outbox.destroy({ where: { sentAt: null, id: { [Op.gt]: before } } });
    await t.close();
    fs.rmSync(mediaDir, { recursive: true, force: true });
  };
  return { ...t, close };
}

export async function member(t: TestApp, roles: Role[], fields: { name?: string; uiLanguage?: string } = {}): Promise<Member> {
  const person = await createPerson(t, { roles, ...fields });
  return { person, auth: bearer((await signIn(t, person.email)).accessToken) };
}

/** A venue, gallery and exhibit (planned end 2027-12-31) of the suite's own, and an admin to set them. */
export async function reviewVenue(t: TestApp, label: string) {
  const admin = await signedInAs(t, 'admin');
  return { admin, ...(await galleryWithExhibit(t, admin, label)) };
}

function expectStatus(res: request.Response, status: number, what: string): request.Response {
  if (res.status !== status) throw new Error(`${what}: expected ${status}, got ${res.status} ${JSON.stringify(res.body)}`);
  return res;
}

/** A story in the exhibit with one panel per document; returns the story and panel ids. */
export async function storyWithPanels(t: TestApp, curator: Headers, exhibitId: number, docs: object[] = [paragraphDoc('Hot rock rises and cool rock sinks.')]) {
  const story = expectStatus(await request(t.http).post('/api/stories').set(curator).send({ title: `Review story ${Math.random().toString(36).slice(2, 8)}`, exhibitId }), 201, 'story');
  const panelIds: number[] = [];
  for (const doc of docs) {
    panelIds.push(expectStatus(await request(t.http).post(`/api/stories/${story.body.id}/panels`).set(curator).send({ doc }), 201, 'panel').body.id);
  }
  return { storyId: story.body.id as number, panelIds };
}

export async function submit(t: TestApp, curator: Headers, storyId: number) {
  return expectStatus(await request(t.http).post(`/api/stories/${storyId}/submit`).set(curator), 201, 'submit').body as { revisionId: number; number: number; state: string; preflight: { check: string; passed: boolean; severity: string; panelId?: number }[] };
}

export const verdict = (t: TestApp, educator: Headers, revisionId: number, body: { verdict: string; note?: string }) =>
  request(t.http).post(`/api/revisions/${revisionId}/reviews`).set(educator).send(body);

/** An image in the venue's library, its renditions made, with the rights and alt text given. */
export async function libraryImage(t: TestApp, curator: Headers, venueId: number, details: Record<string, unknown>): Promise<number> {
  const colour = { r: Math.floor(Math.random() * 256), g: Math.floor(Math.random() * 256), b: Math.floor(Math.random() * 256) };
  const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: colour } }).png().toBuffer();
  const uploaded = expectStatus(await request(t.http).post('/api/media').set(curator).field('venueId', String(venueId)).attach('file', png, 'plate-map.png'), 201, 'upload');
  const id = uploaded.body[0].id as number;
  if ((await prepareRenditions(t, id)) !== 'ready') throw new Error(`renditions of image ${id} were not made`);
  expectStatus(await request(t.http).patch(`/api/media/${id}`).set(curator).send(details), 200, 'media details');
  return id;
}

export const imageDoc = (mediaId: number): PanelDocJSON => ({
  type: 'doc',
  content: [{ type: 'paragraph', content: [{ type: 'text', text: 'The map shows where plates meet.' }] }, { type: 'panelImage', attrs: { mediaId: String(mediaId) } }],
});

export const SLOPE_PARAMS = { massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6 };

export const widgetNode = (widgetId: string, params: Record<string, unknown> = SLOPE_PARAMS): PanelNodeJSON => ({
  type: 'widget',
  attrs: { widgetType: 'slope-force', widgetId, params },
});

export const liveValueDoc = (readsWidgetId: string, ...widgets: PanelNodeJSON[]): PanelDocJSON => ({
  type: 'doc',
  content: [
    {
      type: 'paragraph',
      content: [
        { type: 'text', text: 'The block starts to slide above ' },
        { type: 'liveValue', attrs: { widgetId: readsWidgetId, output: 'criticalAngleDeg', format: { digits: 1, unit: '°' } } },
        { type: 'text', text: '.' },
      ],
    },
    ...widgets,
  ],
});

/** Runs the outbox until nothing more is due, as the worker's timer would. */
export async function deliverAllMail(t: TestApp): Promise<void> {
  const worker = t.app.get(MailOutboxWorker);
  while ((await worker.deliverDue()).sent.length > 0);
}
