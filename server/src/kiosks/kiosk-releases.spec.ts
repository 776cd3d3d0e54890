import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseManifest, type ReleaseFile } from '@mantlepiece/shared';
import { approvedGallery, buildRelease, pairedKiosk, publish } from '../../test/release-fixtures.js';
import { member, reviewVenue } from '../../test/review-fixtures.js';
import { s3StandInEnv } from '../../test/s3-stand-in.js';
import { createTestApp, TestClock, type TestApp } from '../../test/test-app.js';
import { sha256Of } from '../releases/release-file-store.js';

const DAY_MS = 86_400_000;
const folders: string[] = [];
const mediaDir = () => {
  const folder = fs.mkdtempSync(path.join(os.tmpdir(), 'mantlepiece-kiosk-files-'));
  folders.push(folder);
  return folder;
};
afterAll(() => folders.forEach((folder) => fs.rmSync(folder, { recursive: true, force: true })));

/** A gallery with a published release and a kiosk paired to it: the manifest's files and the kiosk's headers. */
async function publishedToKiosk(t: TestApp, label: string) {
  const g = await approvedGallery(t, label);
  const { device } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
  await publish(t, g.technician.auth, (await buildRelease(t, g.technician.auth, g.gallery.id)).id);
  const parsed = parseManifest((await request(t.http).get('/api/kiosk/manifest').set(device)).body.manifest);
  if (!parsed.ok) throw new Error(parsed.message);
  return { g, device, files: parsed.manifest.files };
}

describe.each([
  { name: 'the local disk', env: () => ({ MEDIA_DIR: mediaDir() }) },
  { name: 'the S3 stand-in, streamed through the server (a CDN in front)', env: () => ({ ...s3StandInEnv(), S3_PRESIGNED_URL_SECONDS: '0' }) },
])('kiosk files from $name', ({ env }) => {
  let t: TestApp;
  let device: Record<string, string>;
  let files: ReleaseFile[];
  beforeAll(async () => {
    t = await createTestApp({ env: env() });
    ({ device, files } = await publishedToKiosk(t, 'kiosk-files'));
  });
  afterAll(() => t.close());

  const download = (sha256: string) =>
    request(t.http).get(`/api/kiosk/files/${sha256}`).set(device).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk)).on('end', () => done(null, Buffer.concat(chunks)));
    });

  it('streams every listed file whole, immutable, with the size and hash the manifest names', async () => {
    expect(files.length).toBeGreaterThan(0);
    for (const file of files) {
      const res = await download(file.sha256);
      expect(res.status).toBe(200);
      expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
      expect(res.headers['accept-ranges']).toBe('bytes');
      expect(res.headers['content-type']).toBe(file.mime);
      expect({ sha256: sha256Of(res.body as Buffer), size: (res.body as Buffer).length }).toEqual({ sha256: file.sha256, size: file.size });
    }
  });

  it('answers a byte range with 206 and exactly those bytes, and an unsatisfiable one with 416', async () => {
    // RFC 9110 §14.1.2 (inclusive positions, "bytes=N-" to the end), §15.5.17 (416 with "bytes */size").
    const [file] = files;
    const whole = (await download(file!.sha256)).body as Buffer;
    const tail = await download(file!.sha256).set('Range', 'bytes=10-');
    expect(tail.status).toBe(206);
    expect(tail.headers['content-range']).toBe(`bytes 10-${file!.size - 1}/${file!.size}`);
    expect((tail.body as Buffer).equals(whole.subarray(10))).toBe(true);
    const beyond = await download(file!.sha256).set('Range', `bytes=${file!.size + 5}-`);
    expect(beyond.status).toBe(416);
    expect(beyond.headers['content-range']).toBe(`bytes */${file!.size}`);
  });
});

describe('kiosk files from the S3 stand-in by redirect', () => {
  let t: TestApp;
  let origin: string;
  let device: Record<string, string>;
  let files: ReleaseFile[];
  beforeAll(async () => {
    t = await createTestApp({ env: s3StandInEnv() });
    ({ device, files } = await publishedToKiosk(t, 'kiosk-redirect'));
    await t.app.listen(0, '127.0.0.1');
    origin = `http://127.0.0.1:${(t.app.getHttpServer().address() as AddressInfo).port}`;
  });
  afterAll(() => t.close());

  it('sends the kiosk to a short-lived presigned URL of the bucket that nothing may keep', async () => {
    const [file] = files;
    const res = await request(t.http).get(`/api/kiosk/files/${file!.sha256}`).set(device);
    expect(res.status).toBe(302);
    expect(res.headers['cache-control']).toBe('no-store');
    const location = new URL(res.headers.location!);
    expect(location.origin).toBe(new URL(s3StandInEnv().S3_ENDPOINT).origin);
    // AWS Signature Version 4 query authentication names its lifetime in X-Amz-Expires (S3 API reference, "Authenticating Requests: Using Query Parameters").
    expect(location.searchParams.get('X-Amz-Expires')).toBe('300');
  });

  it('lets the kiosk app connect to the bucket it is sent to, and nowhere else new', async () => {
    const policy = (await request(t.http).get('/api/health')).headers['content-security-policy']!;
    expect(policy).toContain(`connect-src 'self' ${new URL(s3StandInEnv().S3_ENDPOINT).origin};`);
  });

  it('gives a kiosk that follows the redirect the bytes the manifest names, and a range of them', async () => {
    for (const file of files) {
      const res = await fetch(`${origin}/api/kiosk/files/${file.sha256}`, { headers: device });
      expect(res.status).toBe(200);
      expect(res.redirected).toBe(true);
      const bytes = Buffer.from(await res.arrayBuffer());
      expect({ sha256: sha256Of(bytes), size: bytes.length }).toEqual({ sha256: file.sha256, size: file.size });
    }
    const [file] = files;
    const part = await fetch(`${origin}/api/kiosk/files/${file!.sha256}`, { headers: { ...device, Range: 'bytes=10-' } });
    expect(part.status).toBe(206);
    expect(part.headers.get('content-range')).toBe(`bytes 10-${file!.size - 1}/${file!.size}`);
  });

  it('still refuses a file of another gallery, before any redirect', async () => {
    const other = await reviewVenue(t, 'kiosk-redirect-other');
    const technician = await member(t, ['technician']);
    const { device: elsewhere } = await pairedKiosk(t, other.admin, technician.auth, other.gallery.id);
    expect((await request(t.http).get(`/api/kiosk/files/${files[0]!.sha256}`).set(elsewhere)).status).toBe(404);
  });
});

describe('the signed manifest kept per gallery, with two server instances', () => {
  const clockA = new TestClock();
  const clockB = new TestClock();
  let a: TestApp;
  let b: TestApp;
  let kiosk: Awaited<ReturnType<typeof publishedToKiosk>>;
  beforeAll(async () => {
    const env = { MEDIA_DIR: mediaDir(), PUBLICATION_LIFETIME_DAYS: '30' };
    a = await createTestApp({ env, clock: clockA });
    b = await createTestApp({ env, clock: clockB });
    kiosk = await publishedToKiosk(a, 'kiosk-cache');
  });
  afterAll(async () => {
    await a.close();
    await b.close();
  });

  it('answers the publication made on the other instance at the very next poll', async () => {
    const { g, device } = kiosk;
    const first = await request(a.http).get('/api/kiosk/manifest').set(device);
    expect((await request(a.http).get('/api/kiosk/manifest').set(device).set('If-None-Match', first.headers.etag!)).status).toBe(304);

    const next = await buildRelease(b, g.technician.auth, g.gallery.id);
    await publish(b, g.technician.auth, next.id);
    const seen = await request(a.http).get('/api/kiosk/manifest').set(device).set('If-None-Match', first.headers.etag!);
    expect(seen.status).toBe(200);
    const parsed = parseManifest(seen.body.manifest);
    expect(parsed.ok && parsed.manifest.releaseId).toBe(next.id);
    expect(JSON.parse(seen.body.publication.record).sequence).toBe(JSON.parse(first.body.publication.record).sequence + 1);
  });

  it('answers the record the other instance signed again, not its own older copy', async () => {
    const { device } = kiosk;
    const before = await request(a.http).get('/api/kiosk/manifest').set(device);
    clockB.advance(15 * DAY_MS);
    const resigned = await request(b.http).get('/api/kiosk/manifest').set(device);
    expect(JSON.parse(resigned.body.publication.record).expiresAt).not.toBe(JSON.parse(before.body.publication.record).expiresAt);
    const fromA = await request(a.http).get('/api/kiosk/manifest').set(device).set('If-None-Match', before.headers.etag!);
    expect(fromA.status).toBe(200);
    expect(fromA.headers.etag).toBe(resigned.headers.etag);
    expect(fromA.body).toEqual(resigned.body);
  });
});
