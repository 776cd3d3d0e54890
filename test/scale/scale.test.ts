import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import type { RowDataPacket } from 'mysql2/promise';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { verifyManifest, type KioskCredential, type KioskManifestResponse, type PairStartResponse, type ReleaseManifest, type ReleaseView } from '@mantlepiece/shared';
import { apiAs } from '../support/browser';
import { startScaleStack, type ScaleStack } from '../support/scale-stack';
import { joinVenue } from '../support/venues';

// The whole-system scale test (issue 15, point 5): the main journey — upload, submit, approve,
// translate, build, publish, pair, kiosk sync — through nginx in front of two server instances on a
// MariaDB primary with a replica and the S3 stand-in, one instance stopped part-way. Then: every mail
// went out once, every release was built once, every image's renditions were made once.
// `npm run test:scale` runs this file alone.

type Api = Awaited<ReturnType<typeof apiAs>>;

let stack: ScaleStack;
let admin: Api;
const tag = Date.now().toString(36);
const eventually = <T>(read: () => Promise<T> | T, timeout = 45_000) => expect.poll(read, { timeout, interval: 250 });

beforeAll(async () => {
  stack = await startScaleStack();
  admin = await apiAs('admin@demo.test', undefined, stack.url);
}, 300_000);

afterAll(async () => {
  await stack?.stop();
}, 120_000);

/** Lines of every instance's output that say it finished a piece of work, e.g. "release 4 built". */
function workDone(pattern: RegExp): string[] {
  return stack.instances.flatMap((instance) => [...instance.process.recentOutput().matchAll(pattern)].map((match) => match[1]!));
}

const count = (values: string[]) => values.reduce((counts, value) => counts.set(value, (counts.get(value) ?? 0) + 1), new Map<string, number>());

describe('the main journey through a load balancer, two instances, a replica and object storage', () => {
  let venueId: number;
  let galleryId: number;
  let exhibitId: number;
  let stationId: number;
  let imageId: number;
  let storyId: number;
  let release: ReleaseView;
  let credential: KioskCredential;

  it('an admin sets up a venue, a gallery, an exhibit and a station, and gives the demo staff their roles there', async () => {
    venueId = (await admin<{ id: number }>('POST', '/venues', { name: `Scale venue ${tag}`, slug: `scale-${tag}`, sourceLocale: 'en', targetLocales: ['fr'], fallbackToSource: false })).id;
    galleryId = (await admin<{ id: number }>('POST', '/galleries', { venueId, name: 'Ridge hall' })).id;
    exhibitId = (await admin<{ id: number }>('POST', '/exhibits', { galleryId, name: 'The spreading sea floor' })).id;
    stationId = (await admin<{ id: number }>('POST', '/stations', { galleryId, name: `Ridge wall ${tag}`, screenWidthPx: 1920, screenHeightPx: 1080, orientation: 'landscape', mountingHeightMm: 1200 })).id;
    for (const [email, roles, locales] of [
      ['curator@demo.test', ['curator'], []], ['educator@demo.test', ['educator'], []], ['translator@demo.test', ['translator'], ['fr']], ['technician@demo.test', ['technician'], []],
    ] as const) await joinVenue(admin, email, venueId, [...roles], [...locales]);
  });

  it('a curator uploads an image; one instance makes its renditions', async () => {
    const curator = await apiAs('curator@demo.test', undefined, stack.url);
    const png = await sharp({ create: { width: 1600, height: 1000, channels: 3, background: { r: 40, g: 90, b: 140 } } }).png().toBuffer();
    const form = new FormData();
    form.append('venueId', String(venueId));
    form.append('file', new Blob([new Uint8Array(png)], { type: 'image/png' }), 'ridge.png');
    imageId = (await curator<{ id: number }[]>('POST', '/media', form))[0]!.id;
    await eventually(async () => (await curator<{ renditionStatus: { state: string } }>('GET', `/media/${imageId}`)).renditionStatus.state).toBe('ready');
    await curator('PATCH', `/media/${imageId}`, {
      credit: 'Drawing: the venue', licence: { kind: 'spdx', id: 'CC-BY-4.0' }, licenceExpiresOn: '2030-12-31',
      alt: { en: 'A ridge under the sea', fr: 'Une dorsale sous la mer' },
    });
  });

  it('the curator writes a story and submits it; an educator approves it; a translator translates it', async () => {
    const curator = await apiAs('curator@demo.test', undefined, stack.url);
    storyId = (await curator<{ id: number }>('POST', '/stories', { title: `Ridge story ${tag}`, audience: 'family', exhibitId })).id;
    const doc = { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'New sea floor is made at the ridge.' }] }, { type: 'panelImage', attrs: { mediaId: String(imageId) } }] };
    await curator('POST', `/stories/${storyId}/panels`, { doc, position: 0, wordBudget: 60 });
    const { revisionId } = await curator<{ revisionId: number }>('POST', `/stories/${storyId}/submit`, {});
    const educator = await apiAs('educator@demo.test', undefined, stack.url);
    await educator('POST', `/revisions/${revisionId}/reviews`, { verdict: 'approve' });
    const translator = await apiAs('translator@demo.test', undefined, stack.url);
    const units = (await translator<{ items: { unitId: string; source: string; version: number }[] }>('GET', `/stories/${storyId}/translations/fr/units?pageSize=100`)).items;
    expect(units.length).toBeGreaterThan(0);
    for (const unit of units) await translator('PUT', `/stories/${storyId}/translations/fr/units/${encodeURIComponent(unit.unitId)}`, { text: `FR ${unit.source}`, version: unit.version });
  });

  it('a technician asks for a release; one instance is stopped while it builds, and the release is still built once and published', async () => {
    const technician = await apiAs('technician@demo.test', undefined, stack.url);
    const requested = await technician<ReleaseView>('POST', `/galleries/${galleryId}/releases`, {});
    // A graceful stop, as in a rolling restart: the instance finishes the work it holds and takes no more.
    await stack.instances[0]!.process.stop();
    await eventually(async () => (release = await technician<ReleaseView>('GET', `/releases/${requested.id}`)).state, 120_000).toBe('ready');
    await technician('POST', `/releases/${release.id}/publish`);
  });

  it('a kiosk pairs at the station through the remaining instance and syncs the release: signature and every file check', async () => {
    const technician = await apiAs('technician@demo.test', undefined, stack.url);
    const kioskCall = (route: string, init: RequestInit = {}) => fetch(`${stack.url}/api/kiosk${route}`, {
      ...init,
      headers: { 'Content-Type': 'application/json', ...(credential ? { Authorization: `Bearer ${credential.deviceToken}` } : {}), ...init.headers },
    });
    const started = (await (await kioskCall('/pair/start', { method: 'POST', body: '{}' })).json()) as PairStartResponse;
    await technician('POST', `/stations/${stationId}/pair`, { pairingCode: started.pairingCode });
    credential = (await (await kioskCall('/pair/complete', { method: 'POST', body: JSON.stringify({ pollToken: started.pollToken }) })).json()) as KioskCredential;
    expect(credential.stationId).toBe(stationId);

    const answer = (await (await kioskCall('/manifest')).json()) as KioskManifestResponse;
    expect(await verifyManifest(answer.manifest, answer.signature, credential.publicKey), 'the manifest is signed by the venue key').toBe(true);
    const manifest = JSON.parse(answer.manifest) as ReleaseManifest;
    expect(manifest.releaseId).toBe(release.id);
    expect(manifest.stories.find((story) => story.id === storyId)?.title.fr).toBe(`FR Ridge story ${tag}`);
    expect(manifest.files.length).toBeGreaterThan(0);
    for (const file of manifest.files) {
      const response = await kioskCall(`/files/${file.sha256}`);
      expect(response.status).toBe(200);
      expect(createHash('sha256').update(Buffer.from(await response.arrayBuffer())).digest('hex')).toBe(file.sha256);
    }
  });

  it('every mail the journey queued went out exactly once', async () => {
    // The outbox is empty of unsent mail once the remaining instance has worked through it.
    await eventually(async () => {
      const [[row]] = await stack.primary.query<RowDataPacket[]>('SELECT COUNT(*) AS unsent FROM outbox_messages WHERE sent_at IS NULL');
      return Number(row!.unsent);
    }).toBe(0);
    const [sent] = await stack.primary.query<RowDataPacket[]>('SELECT recipient, subject FROM outbox_messages WHERE sent_at IS NOT NULL');
    expect(sent.length, 'the journey sent mail (submitted, approved, translation notices)').toBeGreaterThan(0);
    const delivered = await Promise.all(fs.readdirSync(stack.mailDir).filter((name) => name.endsWith('.eml')).map(async (name) => {
      const mail = await simpleParser(fs.readFileSync(path.join(stack.mailDir, name)));
      return `${mail.headers.get('x-envelope-to') as string} · ${mail.subject}`;
    }));
    expect(count(delivered)).toEqual(count(sent.map((row) => `${row.recipient} · ${row.subject}`)));
  });

  it('every release was built once and every image made once, by one instance or the other', async () => {
    const builds = count(workDone(/release (\d+) built/g));
    expect(builds.get(String(release.id)), `release ${release.id} built`).toBe(1);
    expect([...builds.values()].every((times) => times === 1)).toBe(true);
    const renditions = count(workDone(/image (\d+): \d+ renditions made/g));
    expect(renditions.get(String(imageId)), `image ${imageId} made`).toBe(1);
    expect([...renditions.values()].every((times) => times === 1)).toBe(true);
  });

  it('the replica holds what the journey wrote', async () => {
    await stack.replicaCaughtUp();
    const [[row]] = await stack.replica.query<RowDataPacket[]>('SELECT state FROM releases WHERE id = ?', [release.id]);
    expect(row!.state, 'published, so Live').toBe('live');
  });
});
