import request from 'supertest';
import { ReleasesWorker } from '../src/releases/releases.worker.js';
import { imageDoc, libraryImage, member, reviewVenue, storyWithPanels, submit, verdict, type Headers } from './review-fixtures.js';
import { SUITE_ADDRESS, type TestApp } from './test-app.js';

function expectStatus(res: request.Response, status: number, what: string): request.Response {
  if (res.status !== status) throw new Error(`${what}: expected ${status}, got ${res.status} ${JSON.stringify(res.body)}`);
  return res;
}

/** An approved story with an image, in a gallery of the suite's own (target locale fr). */
export async function approvedGallery(t: TestApp, label: string, { fallbackToSource = true } = {}) {
  const { admin, venue, gallery, exhibit } = await reviewVenue(t, label);
  if (fallbackToSource) expectStatus(await request(t.http).patch(`/api/venues/${venue.id}`).set(admin).send({ fallbackToSource: true }), 200, 'fallback policy');
  const curator = await member(t, ['curator']);
  const educator = await member(t, ['educator']);
  const technician = await member(t, ['technician']);
  const imageId = await libraryImage(t, curator.auth, venue.id, {
    credit: 'Drawing: Tomás Reyes', licence: { kind: 'spdx', id: 'CC-BY-4.0' }, licenceExpiresOn: '2030-12-31',
    alt: { en: 'Two plates meeting at a trench', fr: 'Deux plaques qui se rencontrent à une fosse' },
  });
  const story = await storyWithPanels(t, curator.auth, exhibit.id, [imageDoc(imageId)]);
  const revision = await approve(t, curator.auth, educator.auth, story.storyId);
  return { admin, venue, gallery, exhibit, curator, educator, technician, imageId, story, revisionId: revision };
}

/** Submits the story and approves the revision; an approved story is revised first, as a curator would. */
export async function approve(t: TestApp, curator: Headers, educator: Headers, storyId: number): Promise<number> {
  const { state } = expectStatus(await request(t.http).get(`/api/stories/${storyId}`).set(curator), 200, 'story').body;
  if (state === 'approved') expectStatus(await request(t.http).post(`/api/stories/${storyId}/revise`).set(curator), 200, 'revise');
  const { revisionId } = await submit(t, curator, storyId);
  expectStatus(await verdict(t, educator, revisionId, { verdict: 'approve' }), 201, 'approval');
  return revisionId;
}

/** Asks for a release and runs the worker as its timer would; returns the release as GET shows it. */
export async function buildRelease(t: TestApp, technician: Headers, galleryId: number, body: Record<string, unknown> = {}) {
  const asked = expectStatus(await request(t.http).post(`/api/galleries/${galleryId}/releases`).set(technician).send(body), 202, 'release request');
  await t.app.get(ReleasesWorker).buildQueued();
  return expectStatus(await request(t.http).get(`/api/releases/${asked.body.id}`).set(technician), 200, 'release').body;
}

export async function publish(t: TestApp, technician: Headers, releaseId: number) {
  return expectStatus(await request(t.http).post(`/api/releases/${releaseId}/publish`).set(technician), 200, 'publish').body;
}

/** A kiosk paired to a new station of the gallery; returns its credential. */
export async function pairedKiosk(t: TestApp, admin: Headers, technician: Headers, galleryId: number) {
  const station = expectStatus(await request(t.http).post('/api/stations').set(admin).send({
    galleryId, name: `Station ${Math.random().toString(36).slice(2, 7)}`, screenWidthPx: 1920, screenHeightPx: 1080, orientation: 'landscape', mountingHeightMm: 1000,
  }), 201, 'station').body;
  const started = expectStatus(await request(t.http).post('/api/kiosk/pair/start').set(SUITE_ADDRESS), 201, 'pair start').body;
  expectStatus(await request(t.http).post(`/api/stations/${station.id}/pair`).set(technician).send({ pairingCode: started.pairingCode }), 201, 'pair station');
  const credential = expectStatus(await request(t.http).post('/api/kiosk/pair/complete').send({ pollToken: started.pollToken }), 200, 'pair complete').body;
  return { station, credential, device: { Authorization: `Bearer ${credential.deviceToken}` } };
}
