import { createPublicKey, verify } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parsePublication, type KioskManifestResponse, type PublicationRecord } from '@mantlepiece/shared';
import { approvedGallery, buildRelease, pairedKiosk, publish } from '../../test/release-fixtures.js';
import { createTestApp, TestClock, type TestApp } from '../../test/test-app.js';
import { Publication } from './models/publication.model.js';
import { sha256Of } from './release-file-store.js';

const DAY_MS = 86_400_000;
const mediaDir = fs.mkdtempSync(path.join(os.tmpdir(), 'mantlepiece-publications-'));
const clock = new TestClock();
let t: TestApp;
let g: Awaited<ReturnType<typeof approvedGallery>>;
let device: Record<string, string>;
let venueKey: string;

beforeAll(async () => {
  t = await createTestApp({ clock, env: { MEDIA_DIR: mediaDir, PUBLICATION_LIFETIME_DAYS: '30' } });
  g = await approvedGallery(t, 'publications');
  ({ device } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id));
  venueKey = (await request(t.http).get(`/api/venues/${g.venue.id}/signing-key`).set(g.technician.auth)).body.publicKey;
});
afterAll(async () => {
  await t.close();
  fs.rmSync(mediaDir, { recursive: true, force: true });
});

/** The kiosk's answer, its publication record read after its signature is checked with node:crypto. */
async function kioskAnswer(http = t.http, headers: Record<string, string> = {}) {
  const res = await request(http).get('/api/kiosk/manifest').set(device).set(headers);
  if (res.status !== 200) return { status: res.status, etag: res.headers.etag };
  const body = res.body as KioskManifestResponse;
  const signedByVenue = verify(null, Buffer.from(body.publication.record, 'utf8'), createPublicKey({ key: Buffer.from(venueKey, 'base64'), format: 'der', type: 'spki' }), Buffer.from(body.publication.signature, 'base64'));
  expect(signedByVenue, 'the publication record verifies with the venue key').toBe(true);
  const parsed = parsePublication(body.publication.record);
  if (!parsed.ok) throw new Error(parsed.reason);
  return { status: res.status, etag: res.headers.etag, body, record: parsed.record };
}

const publications = () => t.app.get<typeof Publication>(getModelToken(Publication));
const sequencesOf = async (galleryId: number) => (await publications().findAll({ where: { galleryId }, order: [['sequence', 'ASC']] })).map((p) => ({ sequence: p.sequence, releaseId: p.releaseId, kind: p.kind }));

describe('publication records', () => {
  it('give every publish and rollback of a gallery the next sequence, and the kiosk the latest, signed, vouching for its manifest', async () => {
    // Nothing published yet: the kiosk is answered 204, an expected state it polls through.
    expect((await kioskAnswer()).status).toBe(204);
    const first = await buildRelease(t, g.technician.auth, g.gallery.id);
    const second = await buildRelease(t, g.technician.auth, g.gallery.id);
    await publish(t, g.technician.auth, first.id);
    const one = await kioskAnswer();
    expect(one.record).toEqual<PublicationRecord>({
      format: 'mantlepiece-publication/1', galleryId: g.gallery.id, sequence: 1, releaseId: first.id,
      manifestSha256: sha256Of(Buffer.from(one.body!.manifest, 'utf8')),
      publishedAt: clock.now().toISOString(), signedAt: clock.now().toISOString(), expiresAt: new Date(clock.now().getTime() + 30 * DAY_MS).toISOString(),
    });

    clock.advance(60_000);
    await publish(t, g.technician.auth, second.id);
    expect((await kioskAnswer()).record).toMatchObject({ sequence: 2, releaseId: second.id });

    // The rollback is a new, higher publication pointing at the older release.
    clock.advance(60_000);
    await publish(t, g.technician.auth, first.id);
    const rolledBack = await kioskAnswer();
    expect(rolledBack.record).toMatchObject({ sequence: 3, releaseId: first.id, manifestSha256: one.record!.manifestSha256, publishedAt: clock.now().toISOString() });
    expect(rolledBack.body!.manifest).toBe(one.body!.manifest);
    expect(rolledBack.etag).not.toBe(one.etag);
    expect(await sequencesOf(g.gallery.id)).toEqual([
      { sequence: 1, releaseId: first.id, kind: 'publish' }, { sequence: 2, releaseId: second.id, kind: 'publish' }, { sequence: 3, releaseId: first.id, kind: 'rollback' },
    ]);
    const audit = (await request(t.http).get('/api/audit?action=release.rolled-back').set(g.admin)).body.items;
    expect(audit.find((event: { target: { id: string } }) => event.target.id === String(first.id))?.details).toMatchObject({ sequence: 3, previousReleaseId: second.id });
  });

  it('is signed again with a later expiry, same sequence, once half its lifetime has passed, and not before', async () => {
    const before = await kioskAnswer();
    clock.advance(15 * DAY_MS - 1);
    expect((await kioskAnswer(t.http, { 'If-None-Match': before.etag! })).status).toBe(304);
    clock.advance(1);
    const after = await kioskAnswer(t.http, { 'If-None-Match': before.etag! });
    expect(after.status).toBe(200);
    expect(after.record).toEqual({ ...before.record, signedAt: clock.now().toISOString(), expiresAt: new Date(clock.now().getTime() + 30 * DAY_MS).toISOString() });
    expect((await kioskAnswer(t.http, { 'If-None-Match': after.etag! })).status).toBe(304);
  });

  it('signs on the first ask a publication that has no signed record yet (a release Live before publications existed)', async () => {
    const latest = (await publications().findOne({ where: { galleryId: g.gallery.id }, order: [['sequence', 'DESC']] }))!;
    await latest.update({ record: null, signature: null, expiresAt: null });
    expect((await kioskAnswer()).record).toMatchObject({ sequence: latest.sequence, signedAt: clock.now().toISOString() });
  });
});

describe('publishing at the same moment', () => {
  it('gives concurrent publishes on two server instances distinct, increasing sequences and leaves one release Live', async () => {
    const other = await createTestApp({ clock, env: { MEDIA_DIR: mediaDir } });
    try {
      const h = await approvedGallery(t, 'publications-race');
      const releases = [];
      for (let i = 0; i < 6; i += 1) releases.push(await buildRelease(t, h.technician.auth, h.gallery.id));
      const answers = await Promise.all(releases.map((release, i) => request(i % 2 ? other.http : t.http).post(`/api/releases/${release.id}/publish`).set(h.technician.auth)));
      expect(answers.map((res) => res.status)).toEqual(releases.map(() => 200));

      const sequences = await sequencesOf(h.gallery.id);
      expect(sequences.map((p) => p.sequence)).toEqual([1, 2, 3, 4, 5, 6]);
      expect(new Set(sequences.map((p) => p.releaseId))).toEqual(new Set(releases.map((r) => r.id)));
      // The release of the highest sequence is the one Live: publishes went one after another.
      const states = (await request(t.http).get(`/api/galleries/${h.gallery.id}/releases`).set(h.technician.auth)).body.items as { id: number; state: string }[];
      expect(states.filter((r) => r.state === 'live').map((r) => r.id)).toEqual([sequences.at(-1)!.releaseId]);
      expect(states.filter((r) => r.state === 'superseded')).toHaveLength(5);

      // Publishing one release twice at once: one wins, the other is told it is Live already.
      const again = await buildRelease(t, h.technician.auth, h.gallery.id);
      const twice = await Promise.all([t.http, other.http].map((http) => request(http).post(`/api/releases/${again.id}/publish`).set(h.technician.auth)));
      expect(twice.map((res) => res.status).sort()).toEqual([200, 409]);
      expect((await sequencesOf(h.gallery.id)).at(-1)).toEqual({ sequence: 7, releaseId: again.id, kind: 'publish' });
    } finally {
      await other.close();
    }
  }, 120_000);
});
