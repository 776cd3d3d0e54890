import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DELETION_GRACE_MS, parseManifest } from '@mantlepiece/shared';
import { DeletedItemsJob } from '../src/deletions/deleted-items.job.js';
import { MediaAsset } from '../src/media/models/media-asset.model.js';
import { Panel } from '../src/panels/models/panel.model.js';
import { paragraphDoc } from './authoring-fixtures.js';
import { approve, buildRelease } from './release-fixtures.js';
import { createReviewApp, imageDoc, libraryImage, member, reviewVenue, storyWithPanels, type Headers } from './review-fixtures.js';
import type { TestApp } from './test-app.js';
import { memberAt } from './venue-fixtures.js';

let t: TestApp;
let curator: Headers;
let educator: Headers;
let technician: Headers;
let venueId: number;
let exhibitId: number;
let galleryId: number;

beforeAll(async () => {
  t = await createReviewApp();
  const world = await reviewVenue(t, 'deletions');
  ({ venue: { id: venueId }, exhibit: { id: exhibitId }, gallery: { id: galleryId } } = world);
  // Releases show untranslated stories in the source language, as the release suites' venues do.
  expect((await request(t.http).patch(`/api/venues/${venueId}`).set(world.admin).send({ fallbackToSource: true })).status).toBe(200);
  curator = (await member(t, ['curator'])).auth;
  educator = (await member(t, ['educator'])).auth;
  technician = (await member(t, ['technician'])).auth;
});
afterAll(() => t.close());

const texts = ['First: plates move.', 'Second: ridges push.', 'Third: slabs pull.', 'Fourth: mantle drags.'];
const panelsOf = async (storyId: number) =>
  ((await request(t.http).get(`/api/stories/${storyId}`).set(curator)).body as { panelCount: number; panels: { id: number; position: number; doc: unknown }[] });
const order = async (storyId: number) => (await panelsOf(storyId)).panels.map((panel) => [panel.id, panel.position]);
/** Past the grace the server keeps a deleted row for (shared DELETION_GRACE_MS), by the app's own clock; sessions are signed in again, as access tokens run out meanwhile. */
async function pastTheGrace() {
  t.clock.advance(DELETION_GRACE_MS + 1000);
  [curator, educator, technician] = await Promise.all((['curator', 'educator', 'technician'] as const).map(async (role) => (await member(t, [role])).auth));
}
const purge = () => t.app.get(DeletedItemsJob).purgeExpired();

describe('deleting and restoring a panel', () => {
  it('takes the panel out of the story at once and puts it back in its place, text included', async () => {
    const { storyId, panelIds: [a, b, c] } = await storyWithPanels(t, curator, exhibitId, texts.slice(0, 3).map(paragraphDoc));
    expect((await request(t.http).delete(`/api/panels/${b}`).set(curator)).status).toBe(204);
    expect(await order(storyId)).toEqual([[a, 0], [c, 1]]);
    expect((await panelsOf(storyId)).panelCount).toBe(2);
    // Saving or changing a deleted panel answers as a missing one.
    expect((await request(t.http).put(`/api/panels/${b}`).set(curator).send({ doc: paragraphDoc('late edit'), version: 1 })).status).toBe(404);

    const restored = await request(t.http).post(`/api/panels/${b}/restore`).set(curator);
    expect(restored.status).toBe(200);
    expect(restored.body).toMatchObject({ id: b, position: 1, version: 1, doc: paragraphDoc(texts[1]!) });
    expect(await order(storyId)).toEqual([[a, 0], [b, 1], [c, 2]]);
    expect((await panelsOf(storyId)).panelCount).toBe(3);
  });

  it('restores panels deleted one after another, undone latest first, into the order they had', async () => {
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId, texts.map(paragraphDoc));
    const [a, b, c, d] = panelIds as [number, number, number, number];
    await request(t.http).delete(`/api/panels/${b}`).set(curator);
    await request(t.http).delete(`/api/panels/${d}`).set(curator);
    await request(t.http).delete(`/api/panels/${a}`).set(curator);
    expect(await order(storyId)).toEqual([[c, 0]]);
    for (const id of [a, d, b]) expect((await request(t.http).post(`/api/panels/${id}/restore`).set(curator)).status).toBe(200);
    expect(await order(storyId)).toEqual([[a, 0], [b, 1], [c, 2], [d, 3]]);
  });

  it('answers 409 for a panel that is not deleted, 404 for an unknown one and 403 for an educator', async () => {
    const { panelIds: [a] } = await storyWithPanels(t, curator, exhibitId);
    expect(await request(t.http).post(`/api/panels/${a}/restore`).set(curator)).toMatchObject({ status: 409, body: { message: 'This panel is not deleted.' } });
    expect((await request(t.http).post('/api/panels/999999999/restore').set(curator)).status).toBe(404);
    expect((await request(t.http).post(`/api/panels/${a}/restore`).set(educator)).status).toBe(403);
  });

  it('answers another venue’s deleted panel exactly as a missing one', async () => {
    const { storyId, panelIds: [a] } = await storyWithPanels(t, curator, exhibitId);
    expect((await request(t.http).delete(`/api/panels/${a}`).set(curator)).status).toBe(204);
    const elsewhere = await reviewVenue(t, 'deletions-elsewhere');
    const stranger = await memberAt(t, elsewhere.venue.id, ['curator']);
    const theirs = await request(t.http).post(`/api/panels/${a}/restore`).set(stranger.headers);
    const missing = await request(t.http).post('/api/panels/999999999/restore').set(stranger.headers);
    expect({ status: theirs.status, body: theirs.body }).toEqual({ status: missing.status, body: missing.body });
    expect(await order(storyId)).toEqual([]);
  });

  it('refuses a restore once the grace has passed (404), and the purge then removes the row for good', async () => {
    const { storyId, panelIds: [a, b] } = await storyWithPanels(t, curator, exhibitId, texts.slice(0, 2).map(paragraphDoc));
    await request(t.http).delete(`/api/panels/${a}`).set(curator);
    await pastTheGrace();
    const late = await request(t.http).post(`/api/panels/${a}/restore`).set(curator);
    expect(late.status).toBe(404);
    expect(late.body.message).toMatch(/can be restored for 10 minutes/);
    const panels = t.app.get<typeof Panel>(getModelToken(Panel));
    expect(await panels.findByPk(a, { paranoid: false })).not.toBeNull();
    expect(await purge()).toBeGreaterThanOrEqual(1);
    expect(await panels.findByPk(a, { paranoid: false })).toBeNull();
    expect(await order(storyId)).toEqual([[b, 0]]);
  });

  it('leaves a deleted panel out of the next revision and of the release built from it', async () => {
    const { storyId, panelIds: [a, b] } = await storyWithPanels(t, curator, exhibitId, texts.slice(0, 2).map(paragraphDoc));
    await request(t.http).delete(`/api/panels/${a}`).set(curator);
    const revisionId = await approve(t, curator, educator, storyId);
    const revision = (await request(t.http).get(`/api/revisions/${revisionId}`).set(educator)).body as { snapshot: { panelId: number; position: number }[] };
    expect(revision.snapshot.map((panel) => [panel.panelId, panel.position])).toEqual([[b, 0]]);

    const release = await buildRelease(t, technician, galleryId);
    expect(release.state).toBe('ready');
    const { manifest: text } = (await request(t.http).get(`/api/releases/${release.id}/manifest`).set(technician)).body as { manifest: string };
    const parsed = parseManifest(text);
    if (!parsed.ok) throw new Error(parsed.message);
    const story = parsed.manifest.stories.find((each) => each.id === storyId)!;
    expect(story.panels.map((panel) => panel.id)).toEqual([b]);
    // Once approved, the story is no longer a draft: its deleted panel cannot come back into it.
    expect((await request(t.http).post(`/api/panels/${a}/restore`).set(curator)).status).toBe(409);
  });
});

describe('deleting and restoring an image', () => {
  const details = { credit: 'Drawing: Ana Lima', licence: { kind: 'spdx', id: 'CC-BY-4.0' }, alt: { en: 'A ridge seen from above' } };
  const listIds = async (q: string) => ((await request(t.http).get('/api/media').query({ q, pageSize: 100 }).set(curator)).body as { items: { id: number }[] }).items.map((item) => item.id);

  it('takes the image out of the library at once and brings it back with its details', async () => {
    const id = await libraryImage(t, curator, venueId, details);
    const before = (await request(t.http).get(`/api/media/${id}`).set(curator)).body;
    expect((await request(t.http).delete(`/api/media/${id}`).set(curator)).status).toBe(204);
    expect((await request(t.http).get(`/api/media/${id}`).set(curator)).status).toBe(404);
    expect(await listIds('Ana Lima')).not.toContain(id);

    const restored = await request(t.http).post(`/api/media/${id}/restore`).set(curator);
    expect(restored.status).toBe(200);
    expect(restored.body).toEqual(before);
    expect(await listIds('Ana Lima')).toContain(id);
    expect(await request(t.http).post(`/api/media/${id}/restore`).set(curator)).toMatchObject({ status: 409, body: { message: 'This image is not deleted.' } });
  });

  it('refuses to put a deleted image on a panel, so no revision or release can carry it', async () => {
    const id = await libraryImage(t, curator, venueId, details);
    await request(t.http).delete(`/api/media/${id}`).set(curator);
    const refused = await request(t.http).post(`/api/stories/${(await storyWithPanels(t, curator, exhibitId, [])).storyId}/panels`).set(curator).send({ doc: imageDoc(id) });
    expect(refused.status).toBe(422);
    expect(refused.body.errors).toEqual([expect.objectContaining({ message: `There is no image ${id} in the media library.` })]);
  });

  it('refuses a panel restore whose image was deleted since (422), and takes the panel once the image is back', async () => {
    const id = await libraryImage(t, curator, venueId, details);
    const { panelIds: [panel] } = await storyWithPanels(t, curator, exhibitId, [imageDoc(id)]);
    await request(t.http).delete(`/api/panels/${panel}`).set(curator);
    // The deleted panel no longer counts as a use of the image.
    expect((await request(t.http).delete(`/api/media/${id}`).set(curator)).status).toBe(204);
    expect((await request(t.http).post(`/api/panels/${panel}/restore`).set(curator)).status).toBe(422);
    expect((await request(t.http).post(`/api/media/${id}/restore`).set(curator)).status).toBe(200);
    expect((await request(t.http).post(`/api/panels/${panel}/restore`).set(curator)).status).toBe(200);
  });

  it('refuses a restore once the grace has passed (404), and the purge then removes the row and its files', async () => {
    const id = await libraryImage(t, curator, venueId, details);
    const rendition = (await request(t.http).get(`/api/media/${id}`).set(curator)).body.renditions[0].url as string;
    await request(t.http).delete(`/api/media/${id}`).set(curator);
    // Within the grace the files stay, so a restore brings the image back whole.
    expect((await request(t.http).get(rendition)).status).toBe(200);
    await pastTheGrace();
    expect((await request(t.http).post(`/api/media/${id}/restore`).set(curator)).status).toBe(404);
    await purge();
    expect(await t.app.get<typeof MediaAsset>(getModelToken(MediaAsset)).findByPk(id, { paranoid: false })).toBeNull();
    expect((await request(t.http).get(rendition)).status).toBe(404);
  });
});
