import { createPublicKey, verify } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { verifyAsync } from '@noble/ed25519';
import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseManifest, verifyManifest, type ReleaseManifest } from '@mantlepiece/shared';
import { approve, approvedGallery, buildRelease, pairedKiosk, publish } from '../../test/release-fixtures.js';
import { imageDoc, libraryImage, storyWithPanels } from '../../test/review-fixtures.js';
import { bearer, createPerson, createTestApp, signIn, TestClock, type TestApp } from '../../test/test-app.js';
import { paragraphDoc } from '../../test/authoring-fixtures.js';
import { MediaRendition } from '../media/models/media-rendition.model.js';
import { Story } from '../stories/models/story.model.js';
import { ReleaseFile } from './models/release-file.model.js';
import { BUILD_LEASE_MS } from './release-builder.js';
import { ReleaseBuildFaults, type BuildPoint } from './release-build-faults.js';
import { releaseFileKey, sha256Of } from './release-file-store.js';
import { ReleasesWorker } from './releases.worker.js';

const mediaDir = fs.mkdtempSync(path.join(os.tmpdir(), 'mantlepiece-releases-'));
const clock = new TestClock();
let t: TestApp;

beforeAll(async () => {
  t = await createTestApp({ clock, env: { MEDIA_DIR: mediaDir } });
});
afterAll(async () => {
  await t.close();
  fs.rmSync(mediaDir, { recursive: true, force: true });
});

const storedFile = (sha256: string) => path.join(mediaDir, ...releaseFileKey(sha256).split('/'));
const manifestOf = (text: string): ReleaseManifest => {
  const parsed = parseManifest(text);
  if (!parsed.ok) throw new Error(parsed.message);
  return parsed.manifest;
};

async function signedManifest(t: TestApp, auth: Record<string, string>, releaseId: number) {
  const res = await request(t.http).get(`/api/releases/${releaseId}/manifest`).set(auth);
  expect(res.status).toBe(200);
  return res.body as { manifest: string; signature: string };
}

async function withFault(point: BuildPoint, fault: () => Promise<void>, work: () => Promise<void>) {
  const faults = t.app.get(ReleaseBuildFaults);
  const original = faults.reach.bind(faults);
  faults.reach = async (reached) => (reached === point ? fault() : original(reached));
  try {
    await work();
  } finally {
    faults.reach = original;
  }
}

describe('building a release', () => {
  it('answers 202 at once, shows the build’s progress, and builds the latest approved revision into a signed manifest', async () => {
    const g = await approvedGallery(t, 'release-build');
    const asked = await request(t.http).post(`/api/galleries/${g.gallery.id}/releases`).set(g.technician.auth).send({});
    expect(asked.status).toBe(202);
    expect(asked.body).toEqual({ id: expect.any(Number), state: 'building' });
    const waiting = await request(t.http).get(`/api/releases/${asked.body.id}`).set(g.technician.auth);
    expect(waiting.body).toMatchObject({ state: 'building', progress: 0, phase: 'Waiting for the build worker', manifestUrl: null });

    expect((await t.app.get(ReleasesWorker).buildQueued()).ready).toEqual([asked.body.id]);
    const release = (await request(t.http).get(`/api/releases/${asked.body.id}`).set(g.curator.auth)).body;
    expect(release).toMatchObject({
      id: asked.body.id, galleryId: g.gallery.id, number: 1, state: 'ready', progress: 1, phase: 'Ready to publish',
      manifestUrl: `/api/releases/${asked.body.id}/manifest`, stories: [{ storyId: g.story.storyId, revisionId: g.revisionId, revisionNumber: 1 }],
    });
    expect(release.files).toBeGreaterThan(0);

    const { manifest: text } = await signedManifest(t, g.technician.auth, release.id);
    const manifest = manifestOf(text);
    expect(manifest).toMatchObject({
      format: 'mantlepiece-release/1', releaseId: release.id, number: 1, galleryId: g.gallery.id, fallbackToSource: true,
      venue: { name: g.venue.name, sourceLocale: 'en', locales: ['en', 'fr'] },
      stories: [{ id: g.story.storyId, revisionId: g.revisionId, audience: 'family', panels: [{ id: g.story.panelIds[0], position: 0 }] }],
      media: [{ mediaId: String(g.imageId), alt: { en: 'Two plates meeting at a trench', fr: 'Deux plaques qui se rencontrent à une fosse' }, credit: 'Drawing: Tomás Reyes' }],
    });
    expect(manifest.stories[0]!.panels[0]!.docs.en).toMatchObject({ type: 'doc' });
    // The title is not translated into French: the manifest carries the source's alone, which the kiosk shows as the venue falls back.
    expect(Object.keys(manifest.stories[0]!.title)).toEqual(['en']);
    expect(manifest.media[0]!.renditions.map((r) => r.sha256).sort()).toEqual(manifest.files.map((f) => f.sha256).sort());
    expect(release.bytes).toBe(manifest.files.reduce((sum, file) => sum + file.size, 0));
  });

  it('signs the manifest’s UTF-8 bytes with the venue key, as node:crypto, @noble/ed25519 and the kiosk’s WebCrypto check it', async () => {
    const g = await approvedGallery(t, 'release-signature');
    const release = await buildRelease(t, g.technician.auth, g.gallery.id);
    const { manifest, signature } = await signedManifest(t, g.technician.auth, release.id);
    const key = (await request(t.http).get(`/api/venues/${g.venue.id}/signing-key`).set(g.technician.auth)).body;
    expect(key).toEqual({ venueId: g.venue.id, algorithm: 'Ed25519', publicKey: expect.any(String) });

    const spki = Buffer.from(key.publicKey, 'base64');
    const bytes = Buffer.from(manifest, 'utf8');
    const sig = Buffer.from(signature, 'base64');
    expect(verify(null, bytes, createPublicKey({ key: spki, format: 'der', type: 'spki' }), sig)).toBe(true);
    // Ed25519 SPKI DER is a fixed 12-byte header and the 32-byte raw key (RFC 8410).
    expect(spki.length).toBe(44);
    expect(await verifyAsync(sig, bytes, spki.subarray(12))).toBe(true);
    expect(await verifyAsync(sig, Buffer.from(manifest.replace('"number":1', '"number":2'), 'utf8'), spki.subarray(12))).toBe(false);
    expect(await verifyManifest(manifest, signature, key.publicKey)).toBe(true);
  });

  it('stores every listed file under its SHA-256 with its size, and shares unchanged files between releases', async () => {
    const g = await approvedGallery(t, 'release-files');
    const first = await buildRelease(t, g.technician.auth, g.gallery.id);
    const second = await buildRelease(t, g.technician.auth, g.gallery.id);
    expect(second.number).toBe(2);
    const files = manifestOf((await signedManifest(t, g.technician.auth, first.id)).manifest).files;
    for (const file of files) {
      const bytes = fs.readFileSync(storedFile(file.sha256));
      expect({ sha256: sha256Of(bytes), size: bytes.length, mime: file.mime }).toEqual({ sha256: file.sha256, size: file.size, mime: 'image/webp' });
    }
    expect(manifestOf((await signedManifest(t, g.technician.auth, second.id)).manifest).files).toEqual(files);
  });
});

describe('release rules', () => {
  it('refuses with 422 naming the story and locale when fr is not translated and the venue does not fall back, and builds once it is', async () => {
    const g = await approvedGallery(t, 'release-locales', { fallbackToSource: false });
    const refused = await request(t.http).post(`/api/galleries/${g.gallery.id}/releases`).set(g.technician.auth).send({});
    expect(refused.status).toBe(422);
    expect(refused.body.message).toBe('This release cannot be built yet.');
    expect(refused.body.errors).toContainEqual({ path: ['locales', 'fr', g.story.storyId], message: expect.stringMatching(/in fr: \d+ untranslated of \d+ texts/) });

    const person = await createPerson(t, { roles: ['translator'], locales: ['fr'] });
    const translator = { auth: bearer((await signIn(t, person.email)).accessToken) };
    const units = (await request(t.http).get(`/api/stories/${g.story.storyId}/translations/fr/units?pageSize=100`).set(translator.auth)).body.items as { unitId: string; source: string; version: number; status: string }[];
    for (const unit of units.filter((u) => u.status !== 'translated')) {
      const saved = await request(t.http).put(`/api/stories/${g.story.storyId}/translations/fr/units/${encodeURIComponent(unit.unitId)}`).set(translator.auth).send({ text: `FR ${unit.source}`, version: unit.version });
      expect(saved.status).toBe(200);
    }
    const release = await buildRelease(t, g.technician.auth, g.gallery.id);
    expect(release.state).toBe('ready');
    const manifest = manifestOf((await signedManifest(t, g.technician.auth, release.id)).manifest);
    expect(JSON.stringify(manifest.stories[0]!.panels[0]!.docs.fr)).toContain('FR The map shows where plates meet.');
    const title = units.find((unit) => unit.unitId === `s${g.story.storyId}.title`)!.source;
    expect(manifest.stories[0]!.title).toEqual({ en: title, fr: `FR ${title}` });
    expect(manifest.fallbackToSource).toBe(false);
  });

  it('refuses a licence that has run out by the release date, and a revision that is not approved', async () => {
    const g = await approvedGallery(t, 'release-licence');
    await request(t.http).patch(`/api/media/${g.imageId}`).set(g.curator.auth).send({ licenceExpiresOn: '2020-01-31' });
    const refused = await request(t.http).post(`/api/galleries/${g.gallery.id}/releases`).set(g.technician.auth).send({});
    expect(refused.status).toBe(422);
    expect(refused.body.errors).toContainEqual({ path: ['preflight', 'image-licence-expiry', g.story.storyId, g.story.panelIds[0]], message: expect.stringMatching(/ran out on 2020-01-31/) });

    const draft = await storyWithPanels(t, g.curator.auth, g.exhibit.id, [paragraphDoc('Plates move a few centimetres a year.')]);
    const { body: open } = await request(t.http).post(`/api/stories/${draft.storyId}/submit`).set(g.curator.auth);
    const named = await request(t.http).post(`/api/galleries/${g.gallery.id}/releases`).set(g.technician.auth).send({ revisionIds: [open.revisionId] });
    expect(named.status).toBe(422);
    expect(named.body.errors).toEqual([{ path: ['revisionIds', 0], message: `Revision ${open.revisionId} is not approved.` }]);
  });

  it('refuses people who are not technicians or admins', async () => {
    const g = await approvedGallery(t, 'release-roles');
    const res = await request(t.http).post(`/api/galleries/${g.gallery.id}/releases`).set(g.curator.auth).send({});
    expect(res.status).toBe(403);
  });
});

describe('a build that fails', () => {
  it('is Failed, lists no files and leaves the store as it was, keeping files an earlier release shares', async () => {
    const g = await approvedGallery(t, 'release-fail');
    const good = await buildRelease(t, g.technician.auth, g.gallery.id);
    const shared = manifestOf((await signedManifest(t, g.technician.auth, good.id)).manifest).files.map((f) => f.sha256);
    // A second image only the failing build stores.
    const extra = await approvedStoryWithNewImage(g);
    await withFault('files-stored', async () => { throw new Error('disk full'); }, async () => {
      const failed = await buildRelease(t, g.technician.auth, g.gallery.id);
      expect(failed).toMatchObject({ state: 'failed', failure: 'disk full', manifestUrl: null, files: 0 });
      expect(await t.app.get<typeof ReleaseFile>(getModelToken(ReleaseFile)).count({ where: { releaseId: failed.id } })).toBe(0);
    });
    for (const sha256 of shared) expect(fs.existsSync(storedFile(sha256))).toBe(true);
    for (const sha256 of extra) expect(fs.existsSync(storedFile(sha256))).toBe(false);
  });

  async function approvedStoryWithNewImage(g: Awaited<ReturnType<typeof approvedGallery>>): Promise<string[]> {
    const imageId = await libraryImage(t, g.curator.auth, g.venue.id, { credit: 'Drawing: Noor Haddad', licence: { kind: 'spdx', id: 'CC0-1.0' }, alt: { en: 'A ridge', fr: 'Une dorsale' } });
    const story = await storyWithPanels(t, g.curator.auth, g.exhibit.id, [imageDoc(imageId)]);
    await approve(t, g.curator.auth, g.educator.auth, story.storyId);
    const rows = await t.app.get<typeof MediaRendition>(getModelToken(MediaRendition)).findAll({ where: { mediaAssetId: imageId } });
    return rows.map((r) => r.sha256);
  }
});

describe('publishing and rolling back', () => {
  it('keeps one Live release per gallery, supersedes the one before, rolls back to it, and marks its stories released', async () => {
    const g = await approvedGallery(t, 'release-publish');
    const first = await buildRelease(t, g.technician.auth, g.gallery.id);
    const stories = t.app.get<typeof Story>(getModelToken(Story));
    expect((await stories.findByPk(g.story.storyId))!.releasedAt).toBeNull();

    expect(await publish(t, g.technician.auth, first.id)).toMatchObject({ state: 'live', publishedAt: clock.now().toISOString() });
    expect((await stories.findByPk(g.story.storyId))!.releasedAt).toEqual(clock.now());

    const second = await buildRelease(t, g.technician.auth, g.gallery.id);
    await publish(t, g.technician.auth, second.id);
    const states = async () => Object.fromEntries(
      ((await request(t.http).get(`/api/galleries/${g.gallery.id}/releases`).set(g.educator.auth)).body.items as { number: number; state: string }[]).map((r) => [r.number, r.state]),
    );
    expect(await states()).toEqual({ 1: 'superseded', 2: 'live' });
    await publish(t, g.technician.auth, first.id);
    expect(await states()).toEqual({ 1: 'live', 2: 'superseded' });

    const again = await request(t.http).post(`/api/releases/${first.id}/publish`).set(g.technician.auth);
    expect(again.status).toBe(409);
    const audit = (await request(t.http).get('/api/audit?action=release.rolled-back').set(g.admin)).body.items;
    expect(audit[0]).toMatchObject({ action: 'release.rolled-back' });
  });

  it('compares two releases story by story', async () => {
    const g = await approvedGallery(t, 'release-compare');
    const first = await buildRelease(t, g.technician.auth, g.gallery.id);
    const newer = await approve(t, g.curator.auth, g.educator.auth, g.story.storyId);
    const added = await storyWithPanels(t, g.curator.auth, g.exhibit.id, [paragraphDoc('Hot rock rises under ridges.')]);
    await approve(t, g.curator.auth, g.educator.auth, added.storyId);
    const second = await buildRelease(t, g.technician.auth, g.gallery.id);
    const res = await request(t.http).get(`/api/releases/compare?a=${first.id}&b=${second.id}`).set(g.curator.auth);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      a: { id: first.id, number: 1 }, b: { id: second.id, number: 2 }, removed: [], unchanged: [],
      added: [{ storyId: added.storyId }],
      changed: [{ storyId: g.story.storyId, from: { revisionId: g.revisionId }, to: { revisionId: newer } }],
    });
  });
});

// Last: it replaces the app, as a server restart would.
describe('a build killed half-way', () => {
  it('stays invisible while it hangs, and the next server start marks it Failed and removes the files only it stored', async () => {
    const g = await approvedGallery(t, 'release-killed');
    const { device } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
    let reached!: () => void;
    const atFault = new Promise<void>((resolve) => (reached = resolve));
    let releaseId = 0;
    let stored: string[] = [];
    await withFault('signed', () => { reached(); return new Promise<void>(() => {}); }, async () => {
      const asked = await request(t.http).post(`/api/galleries/${g.gallery.id}/releases`).set(g.technician.auth).send({});
      releaseId = asked.body.id;
      void t.app.get(ReleasesWorker).buildQueued();
      await atFault;
      stored = (await t.app.get<typeof ReleaseFile>(getModelToken(ReleaseFile)).findAll({ where: { releaseId } })).map((f) => f.sha256);
      expect(stored.length).toBeGreaterThan(0);
      expect((await request(t.http).get(`/api/releases/${releaseId}`).set(g.technician.auth)).body).toMatchObject({ state: 'building', manifestUrl: null });
      expect((await request(t.http).get('/api/kiosk/manifest').set(device)).status).toBe(204);
      expect((await request(t.http).get(`/api/kiosk/files/${stored[0]}`).set(device)).status).toBe(404);
      const publishing = await request(t.http).post(`/api/releases/${releaseId}/publish`).set(g.technician.auth);
      expect(publishing.status).toBe(409);
    });

    // The process is gone with the build stuck where it was; the next start is a new app on the same database and store.
    await t.close();
    clock.advance(BUILD_LEASE_MS + 1000);
    t = await createTestApp({ clock, env: { MEDIA_DIR: mediaDir } });
    const after = (await request(t.http).get(`/api/releases/${releaseId}`).set(g.technician.auth)).body;
    expect(after).toMatchObject({ state: 'failed', failure: expect.stringMatching(/stopped before it finished/), files: 0 });
    for (const sha256 of stored) expect(fs.existsSync(storedFile(sha256))).toBe(false);
  });
});
