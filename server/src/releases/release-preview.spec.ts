import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseManifest, type ReleasePreview, type TranslationUnitView } from '@mantlepiece/shared';
import { approve, approvedGallery, buildRelease, publish } from '../../test/release-fixtures.js';
import { storyWithPanels, type Headers } from '../../test/review-fixtures.js';
import { bearer, createPerson, createTestApp, signIn, TestClock, type TestApp } from '../../test/test-app.js';

const mediaDir = fs.mkdtempSync(path.join(os.tmpdir(), 'mantlepiece-release-preview-'));
let t: TestApp;

beforeAll(async () => {
  t = await createTestApp({ clock: new TestClock(), env: { MEDIA_DIR: mediaDir } });
});
afterAll(async () => {
  await t.close();
  fs.rmSync(mediaDir, { recursive: true, force: true });
});

type Gallery = Awaited<ReturnType<typeof approvedGallery>>;

/** A second approved story in the gallery, one paragraph, optionally translated into French throughout. */
async function secondStory(g: Gallery, { translated }: { translated: boolean }) {
  const story = await storyWithPanels(t, g.curator.auth, g.exhibit.id);
  await approve(t, g.curator.auth, g.educator.auth, story.storyId);
  if (translated) await translateIntoFrench(story.storyId);
  return story;
}

async function translateIntoFrench(storyId: number) {
  const translator = bearer((await signIn(t, (await createPerson(t, { roles: ['translator'], locales: ['fr'] })).email)).accessToken);
  const units = (await request(t.http).get(`/api/stories/${storyId}/translations/fr/units`).set(translator).expect(200)).body.items as TranslationUnitView[];
  for (const unit of units.filter((each) => each.status !== 'translated')) {
    await request(t.http).put(`/api/stories/${storyId}/translations/fr/units/${unit.unitId}`).set(translator)
      .send({ text: `Texte en français ${unit.unitId}`, version: unit.version }).expect(200);
  }
}

const preview = (auth: Headers, galleryId: number, query: Record<string, string> = {}) =>
  request(t.http).get(`/api/galleries/${galleryId}/releases/preview`).query(query).set(auth);

async function manifestOf(auth: Headers, releaseId: number) {
  const res = await request(t.http).get(`/api/releases/${releaseId}/manifest`).set(auth).expect(200);
  const parsed = parseManifest(res.body.manifest);
  if (!parsed.ok) throw new Error(parsed.message);
  return parsed.manifest;
}

const releaseCount = async (auth: Headers, galleryId: number) =>
  (await request(t.http).get(`/api/galleries/${galleryId}/releases`).set(auth).expect(200)).body.total as number;

// Each test sets up galleries, approvals and builds of its own: slow on a loaded machine, not waiting on time.
describe('the build preview', { timeout: 120_000 }, () => {
  it('lists each story and locale with what is untranslated, and offers only to leave the story out where the venue shows no source text', async () => {
    const g = await approvedGallery(t, 'preview-missing', { fallbackToSource: false });
    const done = await secondStory(g, { translated: true });

    const res = await preview(g.technician.auth, g.gallery.id);
    expect(res.status).toBe(200);
    const body = res.body as ReleasePreview;
    expect(body).toMatchObject({ galleryId: g.gallery.id, sourceLocale: 'en', fallbackToSource: false, sameAsLive: null, buildable: false, problems: [] });
    // Counted by hand: the fixture story has a title, one paragraph and one image, whose alt text the library holds in French.
    expect(body.stories.find((s) => s.storyId === g.story.storyId)).toMatchObject({
      revisionId: g.revisionId, missing: [{ locale: 'fr', total: 3, untranslated: 2, stale: 0 }], choices: ['leave-out'], choice: null,
    });
    expect(body.stories.find((s) => s.storyId === done.storyId)).toMatchObject({ missing: [], choices: [], choice: null });

    // Asked for as it is, the build is refused naming the story and the locale, and nothing is built.
    const before = await releaseCount(g.technician.auth, g.gallery.id);
    const refused = await request(t.http).post(`/api/galleries/${g.gallery.id}/releases`).set(g.technician.auth).send({});
    expect(refused.status).toBe(422);
    expect(refused.body.errors).toEqual([{ path: ['locales', 'fr', g.story.storyId], message: expect.stringMatching(/in fr: 2 untranslated of 3 texts\. Leave the story out/) }]);
    expect(await releaseCount(g.technician.auth, g.gallery.id)).toBe(before);

    const leftOut = (await preview(g.technician.auth, g.gallery.id, { leaveOut: String(g.story.storyId) }).expect(200)).body as ReleasePreview;
    expect(leftOut.buildable).toBe(true);
    expect(leftOut.stories.map((s) => [s.storyId, s.choice])).toEqual(expect.arrayContaining([[g.story.storyId, 'leave-out'], [done.storyId, null]]));

    // The build honours the choice: the story left out is absent from the release and its manifest.
    const release = await buildRelease(t, g.technician.auth, g.gallery.id, { leaveOut: [g.story.storyId] });
    expect(release.state).toBe('ready');
    expect(release.stories.map((s: { storyId: number }) => s.storyId)).toEqual([done.storyId]);
    const manifest = await manifestOf(g.technician.auth, release.id);
    expect(manifest.stories.map((s) => s.id)).toEqual([done.storyId]);
    expect(Object.keys(manifest.stories[0]!.title).sort()).toEqual(['en', 'fr']);
  });

  it('shows a story in the source language where the venue allows it, and refuses that choice where it does not', async () => {
    const allowing = await approvedGallery(t, 'preview-fallback');
    const offered = (await preview(allowing.technician.auth, allowing.gallery.id).expect(200)).body as ReleasePreview;
    expect(offered).toMatchObject({ fallbackToSource: true, buildable: true });
    expect(offered.stories).toEqual([expect.objectContaining({ storyId: allowing.story.storyId, choices: ['show-in-source', 'leave-out'], choice: 'show-in-source' })]);
    const release = await buildRelease(t, allowing.technician.auth, allowing.gallery.id, { showInSource: [allowing.story.storyId] });
    const manifest = await manifestOf(allowing.technician.auth, release.id);
    // No French title is carried: the kiosk shows the English one (kiosk/src/player/release-content.ts looks up the venue's language next).
    expect(manifest.stories.map((s) => [s.id, Object.keys(s.title)])).toEqual([[allowing.story.storyId, ['en']]]);

    const strict = await approvedGallery(t, 'preview-strict', { fallbackToSource: false });
    for (const res of [
      await request(t.http).post(`/api/galleries/${strict.gallery.id}/releases`).set(strict.technician.auth).send({ showInSource: [strict.story.storyId] }),
      await preview(strict.technician.auth, strict.gallery.id, { showInSource: String(strict.story.storyId) }),
    ]) {
      expect(res.status).toBe(422);
      expect(res.body.errors).toEqual([{ path: ['showInSource', 0], message: expect.stringContaining('does not let kiosks show untranslated texts in the source language') }]);
    }
  });

  it('refuses choices naming a story outside the release, one story twice or both ways, or leaving every story out, and builds nothing', async () => {
    const g = await approvedGallery(t, 'preview-bad-choice');
    const before = await releaseCount(g.technician.auth, g.gallery.id);
    const ask = (body: object) => request(t.http).post(`/api/galleries/${g.gallery.id}/releases`).set(g.technician.auth).send(body);
    const outside = await ask({ leaveOut: [2_000_000_000] });
    expect(outside.status).toBe(422);
    expect(outside.body.errors).toEqual([{ path: ['leaveOut', 0], message: 'Story 2000000000 is not among the stories this release would carry.' }]);
    const both = await ask({ leaveOut: [g.story.storyId], showInSource: [g.story.storyId] });
    expect(both.status).toBe(422);
    expect(both.body.errors).toEqual([{ path: ['showInSource', 0], message: expect.stringContaining('is also left out') }]);
    const everything = await ask({ leaveOut: [g.story.storyId] });
    expect(everything.status).toBe(422);
    expect(everything.body.errors).toEqual([{ path: ['leaveOut'], message: 'Every story would be left out; keep at least one.' }]);
    for (const body of [{ leaveOut: [g.story.storyId, g.story.storyId] }, { leaveOut: ['first'] }, { showInSource: 'all' }]) {
      const res = await ask(body);
      expect({ body, status: res.status }).toEqual({ body, status: 400 });
      expect(res.body.errors?.[0]?.path?.[0]).toMatch(/^(leaveOut|showInSource)$/);
    }
    const badQuery = await preview(g.technician.auth, g.gallery.id, { leaveOut: '4,x' });
    expect(badQuery.status).toBe(400);
    expect(badQuery.body.errors).toContainEqual({ path: ['leaveOut'], message: 'A story is named by its id.' });
    expect(await releaseCount(g.technician.auth, g.gallery.id)).toBe(before);
  });

  it('says when a build would carry exactly what the Live release carries, choices included', async () => {
    const g = await approvedGallery(t, 'preview-same');
    expect((await preview(g.technician.auth, g.gallery.id).expect(200)).body.sameAsLive).toBeNull();
    const live = await buildRelease(t, g.technician.auth, g.gallery.id);
    await publish(t, g.technician.auth, live.id);
    expect((await preview(g.technician.auth, g.gallery.id).expect(200)).body.sameAsLive).toEqual({ id: live.id, number: live.number });

    const added = await secondStory(g, { translated: false });
    expect((await preview(g.technician.auth, g.gallery.id).expect(200)).body.sameAsLive).toBeNull();
    // Leaving the new story out gives the Live content again; built anyway, its manifest differs from the Live one only in what names the build.
    expect((await preview(g.technician.auth, g.gallery.id, { leaveOut: String(added.storyId) }).expect(200)).body.sameAsLive).toEqual({ id: live.id, number: live.number });
    const again = await buildRelease(t, g.technician.auth, g.gallery.id, { leaveOut: [added.storyId] });
    const [a, b] = [await manifestOf(g.technician.auth, live.id), await manifestOf(g.technician.auth, again.id)];
    expect({ ...b, releaseId: a.releaseId, number: a.number, createdAt: a.createdAt }).toEqual(a);
  });

  it('is for those who build releases: a curator is refused', async () => {
    const g = await approvedGallery(t, 'preview-roles');
    expect((await preview(g.curator.auth, g.gallery.id)).status).toBe(403);
  });
});
