import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { crc32 } from 'node:zlib';
import exifr from 'exifr';
import sharp, { type Sharp } from 'sharp';
import request from 'supertest';
import { getModelToken } from '@nestjs/sequelize';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { galleryWithExhibit, signedInAs } from '../../test/authoring-fixtures.js';
import { prepareRenditions } from '../../test/media-fixtures.js';
import { createTestApp, type TestApp } from '../../test/test-app.js';
import { MediaService } from './media.service.js';
import { MediaAsset } from './models/media-asset.model.js';

const MAX_BYTES = 400_000;
const MAX_PIXELS = 4_000_000;
const mediaDir = fs.mkdtempSync(path.join(os.tmpdir(), 'mantlepiece-media-'));

let t: TestApp;
let curator: Record<string, string>;
let venueId: number;

beforeAll(async () => {
  t = await createTestApp({ env: { MEDIA_DIR: mediaDir, MEDIA_MAX_BYTES: String(MAX_BYTES), MEDIA_MAX_PIXELS: String(MAX_PIXELS) } });
  curator = await signedInAs(t, 'curator');
  venueId = (await galleryWithExhibit(t, await signedInAs(t, 'admin'), 'media')).venue.id;
});
afterAll(async () => {
  await t.close();
  fs.rmSync(mediaDir, { recursive: true, force: true });
});

/** A picture no other test has uploaded (its colour is random), so "stored once" checks are honest. */
const picture = (width: number, height: number) =>
  sharp({ create: { width, height, channels: 3, background: { r: Math.floor(Math.random() * 256), g: Math.floor(Math.random() * 256), b: Math.floor(Math.random() * 256) } } });

const upload = (...files: [Buffer, string][]) => {
  const req = request(t.http).post('/api/media').set(curator).field('venueId', String(venueId));
  for (const [data, name] of files) req.attach('file', data, name);
  return req;
};

const storedOriginal = (sha256: string) => path.join(mediaDir, 'originals', sha256);

/** The image as the library shows it once the renditions worker (its timer is off in the suites) has made its renditions. */
async function prepared(asset: { id: number }) {
  expect(await prepareRenditions(t, asset.id)).toBe('ready');
  return (await request(t.http).get(`/api/media/${asset.id}`).set(curator)).body;
}

/** Every file under the media folder, to show a refused upload stored nothing. */
const storedFiles = () => (fs.existsSync(mediaDir) ? fs.readdirSync(mediaDir, { recursive: true, withFileTypes: true }).filter((entry) => entry.isFile()).length : 0);
const assetCount = () => t.app.get<typeof MediaAsset>(getModelToken(MediaAsset)).count();

/**
 * What exifr finds of EXIF (camera, GPS, interoperability, thumbnail), XMP and IPTC; a colour
 * profile (ICC) and the format's own header (JFIF, PNG's IHDR) carry nothing about who or where.
 */
const personalMetadata = (data: Buffer) =>
  exifr.parse(data, { tiff: true, ifd0: {}, ifd1: true, exif: true, gps: true, interop: true, xmp: true, iptc: true, icc: false, jfif: false, ihdr: false });

/** The first half of an image: its header reads, its pixels end early. */
const truncated = (data: Buffer) => data.subarray(0, Math.floor(data.length / 2));

/** The chunks of a WebP (RIFF) file by their four-letter ids. */
function webpChunks(data: Buffer): Map<string, Buffer> {
  const chunks = new Map<string, Buffer>();
  for (let offset = 12; offset + 8 <= data.length;) {
    const size = data.readUInt32LE(offset + 4);
    chunks.set(data.toString('latin1', offset, offset + 4), data.subarray(offset + 8, offset + 8 + size));
    offset += 8 + size + (size % 2);
  }
  return chunks;
}

/** GPS from a WebP's EXIF chunk, read by exifr (which reads the TIFF-structured EXIF but not the RIFF around it). */
async function gpsOfWebp(data: Buffer): Promise<unknown> {
  const chunk = webpChunks(data).get('EXIF');
  if (!chunk) return null;
  // Some writers put JPEG's "Exif\0\0" marker before the TIFF header; exifr wants the TIFF header first.
  const tiff = chunk.subarray(0, 6).toString('latin1') === 'Exif\0\0' ? chunk.subarray(6) : chunk;
  return (await exifr.gps(tiff)) ?? null;
}

const GPS_EXIF = {
  IFD0: { Make: 'Suite Camera', Model: 'Field Unit' },
  IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '64/1 8/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '21/1 56/1 0/1' },
};

describe('POST /api/media', () => {
  it.each([
    ['JPEG', 'jpeg', 'image/jpeg', (s: Sharp) => s.jpeg()],
    ['PNG', 'png', 'image/png', (s: Sharp) => s.png()],
    ['WebP', 'webp', 'image/webp', (s: Sharp) => s.webp()],
    ['AVIF', 'avif', 'image/avif', (s: Sharp) => s.avif()],
    ['TIFF', 'tiff', 'image/tiff', (s: Sharp) => s.tiff()],
  ])('accepts %s: renditions at 640 px and the original width (never upscaled), a placeholder, the type from the bytes', async (_label, extension, mime, encode) => {
    const data = await encode(picture(1000, 750)).toBuffer();
    // The name says something else: the type must come from the bytes.
    const res = await upload([data, `photo.${extension === 'png' ? 'jpg' : 'png'}`]);
    expect(res.status).toBe(201);
    const asset = await prepared(res.body[0]);
    expect(asset).toMatchObject({ mime, width: 1000, height: 750, credit: null, licence: null, alt: {}, usedIn: [] });
    // The size of the original as kept, re-encoded without metadata (see the EXIF tests below).
    expect(asset.bytes).toBe(fs.statSync(storedOriginal(asset.sha256)).size);
    expect(asset.renditions).toEqual([
      { width: 640, url: `/media/${asset.sha256}/640.webp` },
      { width: 1000, url: `/media/${asset.sha256}/1000.webp` },
    ]);
    expect(asset.placeholder).toMatch(/^data:image\/webp;base64,/);
  });

  it('writes 640, 1280 and 1920 px renditions of a large image, served publicly as immutable WebP', async () => {
    const data = await picture(2400, 1200).png().toBuffer();
    const asset = await prepared((await upload([data, 'wide.png'])).body[0]);
    expect(asset.renditions.map((r: { width: number }) => r.width)).toEqual([640, 1280, 1920]);
    const file = await request(t.http).get(asset.renditions[1].url).buffer(true);
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toBe('image/webp');
    expect(file.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(await sharp(file.body).metadata()).toMatchObject({ format: 'webp', width: 1280, height: 640 });
  });

  it('auto-orients and strips EXIF: a JPEG carrying GPS gives renditions with no GPS, no camera and no EXIF at all', async () => {
    // 400 × 200 stored sideways (orientation 6: turn 90° clockwise to view), so it is seen as 200 × 400.
    const data = await picture(400, 200).jpeg().withExif(GPS_EXIF).withMetadata({ orientation: 6 }).toBuffer();
    expect(await exifr.gps(data)).toMatchObject({ latitude: expect.closeTo(64.133, 2) });
    // The check below can see GPS in a WebP: a WebP written with the same EXIF shows it.
    expect(await gpsOfWebp(await picture(40, 20).webp().withExif(GPS_EXIF).toBuffer())).toMatchObject({ latitude: expect.closeTo(64.133, 2) });

    const asset = await prepared((await upload([data, 'field-trip.jpg'])).body[0]);
    expect(asset).toMatchObject({ width: 200, height: 400 });
    for (const rendition of asset.renditions) {
      const file = (await request(t.http).get(rendition.url).buffer(true)).body as Buffer;
      expect(await gpsOfWebp(file)).toBeNull();
      expect([...webpChunks(file).keys()].filter((id) => ['EXIF', 'XMP '].includes(id))).toEqual([]);
      const metadata = await sharp(file).metadata();
      expect({ exif: metadata.exif, width: metadata.width, height: metadata.height }).toEqual({ exif: undefined, width: 200, height: 400 });
    }
  });

  it('stores the original upright and without metadata: a JPEG carrying GPS is kept with no EXIF, GPS, XMP or IPTC on disk', async () => {
    const data = await picture(400, 200).jpeg().withExif(GPS_EXIF).withMetadata({ orientation: 6 }).toBuffer();
    // exifr, a reader independent of sharp, sees the camera and the position in what was uploaded.
    expect(await personalMetadata(data)).toMatchObject({ Make: 'Suite Camera', latitude: expect.closeTo(64.133, 2) });

    const [asset] = (await upload([data, 'field-trip-original.jpg'])).body;
    const stored = fs.readFileSync(storedOriginal(asset.sha256));
    expect(await personalMetadata(stored)).toBeUndefined();
    expect(await exifr.gps(stored)).toBeUndefined();
    const metadata = await sharp(stored).metadata();
    expect({ format: metadata.format, width: metadata.width, height: metadata.height, orientation: metadata.orientation, exif: metadata.exif, xmp: metadata.xmp, iptc: metadata.iptc })
      .toEqual({ format: 'jpeg', width: 200, height: 400, orientation: undefined, exif: undefined, xmp: undefined, iptc: undefined });
    expect(asset).toMatchObject({ mime: 'image/jpeg', width: 200, height: 400, bytes: stored.length });
  });

  it('keeps a PNG original without its EXIF too', async () => {
    const data = await picture(300, 200).png().withExif(GPS_EXIF).toBuffer();
    expect(await exifr.gps(data)).toMatchObject({ latitude: expect.closeTo(64.133, 2) });
    const [asset] = (await upload([data, 'field-trip.png'])).body;
    const stored = fs.readFileSync(storedOriginal(asset.sha256));
    expect(await personalMetadata(stored)).toBeUndefined();
    expect((await sharp(stored).metadata()).exif).toBeUndefined();
  });

  it('keeps again without metadata an original stored with it before (the CLI\'s strip-originals), and leaves clean ones alone', async () => {
    const data = await picture(300, 150).jpeg().withExif(GPS_EXIF).withMetadata({ orientation: 6 }).toBuffer();
    const [asset] = (await upload([data, 'stored-before.jpg'])).body;
    // As an upload was kept before originals were stripped: the bytes as they came.
    fs.writeFileSync(storedOriginal(asset.sha256), data);
    expect(await exifr.gps(fs.readFileSync(storedOriginal(asset.sha256)))).toMatchObject({ latitude: expect.closeTo(64.133, 2) });

    const media = t.app.get(MediaService);
    expect(await media.stripStoredOriginals()).toBe(1);
    const stored = fs.readFileSync(storedOriginal(asset.sha256));
    expect(await personalMetadata(stored)).toBeUndefined();
    expect(await sharp(stored).metadata()).toMatchObject({ width: 150, height: 300 });
    expect((await request(t.http).get(`/api/media/${asset.id}`).set(curator)).body.bytes).toBe(stored.length);
    expect(await media.stripStoredOriginals()).toBe(0);
  });

  it('stores the same upload once and answers with the asset already there', async () => {
    const data = await picture(300, 200).png().toBuffer();
    const first = await upload([data, 'first-name.png']);
    const again = await upload([data, 'second-name.png']);
    expect(again.status).toBe(201);
    expect(again.body[0]).toMatchObject({ id: first.body[0].id, filename: 'first-name.png' });
    expect(fs.readdirSync(path.join(mediaDir, 'originals')).filter((name) => name === first.body[0].sha256)).toHaveLength(1);
  });

  it('takes several files in one upload', async () => {
    const res = await upload([await picture(100, 100).png().toBuffer(), 'one.png'], [await picture(120, 100).jpeg().toBuffer(), 'two.jpg']);
    expect(res.status).toBe(201);
    expect(res.body.map((asset: { filename: string }) => asset.filename)).toEqual(['one.png', 'two.jpg']);
  });

  it.each([
    ['PNG', (s: Sharp) => s.png()],
    ['JPEG', (s: Sharp) => s.jpeg()],
  ])('refuses a truncated %s whose header is valid with 422 "could not read this image", naming the file, and stores nothing', async (label, encode) => {
    const whole = await encode(sharp(randomBytes(200 * 150 * 3), { raw: { width: 200, height: 150, channels: 3 } })).toBuffer();
    const cut = truncated(whole);
    expect(await sharp(cut).metadata()).toMatchObject({ width: 200, height: 150 });
    const [files, assets] = [storedFiles(), await assetCount()];
    const res = await upload([cut, `cut-short.${label.toLowerCase()}`]);
    const message = `Could not read this image: cut-short.${label.toLowerCase()} is damaged or incomplete. Save or export it again, then upload it.`;
    expect({ status: res.status, body: res.body }).toEqual({ status: 422, body: { statusCode: 422, message, errors: [{ path: ['file'], message }] } });
    expect([storedFiles(), await assetCount()]).toEqual([files, assets]);
  });

  it('takes an upload of several files all or nothing: a bad second file refuses the first too', async () => {
    const good = await picture(120, 90).png().toBuffer();
    const bad = truncated(await sharp(randomBytes(200 * 150 * 3), { raw: { width: 200, height: 150, channels: 3 } }).png().toBuffer());
    const [files, assets] = [storedFiles(), await assetCount()];
    const res = await upload([good, 'good.png'], [bad, 'bad.png']);
    expect(res.status).toBe(422);
    expect(res.body.message).toMatch(/^Could not read this image: bad\.png/);
    expect([storedFiles(), await assetCount()]).toEqual([files, assets]);
    // The good file alone is taken.
    expect((await upload([good, 'good.png'])).status).toBe(201);
  });

  it('takes back the files it wrote when recording the rows fails, leaving no row and no file', async () => {
    const assets = t.app.get<typeof MediaAsset>(getModelToken(MediaAsset));
    const create = assets.create.bind(assets);
    let calls = 0;
    const spy = vi.spyOn(assets, 'create').mockImplementation(((...args: Parameters<typeof create>) => {
      calls += 1;
      return calls === 2 ? Promise.reject(new Error('the database went away')) : create(...args);
    }) as typeof assets.create);
    try {
      const [files, assets] = [storedFiles(), await assetCount()];
      const res = await upload([await picture(100, 80).png().toBuffer(), 'first.png'], [await picture(90, 80).png().toBuffer(), 'second.png']);
      expect(res.status).toBe(500);
      expect(calls).toBe(2);
      expect([storedFiles(), await assetCount()]).toEqual([files, assets]);
    } finally {
      spy.mockRestore();
    }
  });

  it('refuses a text file renamed .jpg with 415', async () => {
    const res = await upload([Buffer.from('This is not a picture, just words in a file.\n'.repeat(4)), 'holiday.jpg']);
    expect(res.status).toBe(415);
    expect(res.body).toEqual({ statusCode: 415, message: expect.stringMatching(/JPEG, PNG, WebP, AVIF or TIFF/) });
  });

  it('refuses an SVG with 415, even one named .png', async () => {
    const svg = Buffer.from('<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg" width="100" height="100"><script>alert(1)</script><rect width="100" height="100"/></svg>');
    expect((await upload([svg, 'diagram.svg'])).status).toBe(415);
    expect((await upload([svg, 'diagram.png'])).status).toBe(415);
  });

  it('refuses a GIF with 415', async () => {
    expect((await upload([await picture(20, 20).gif().toBuffer(), 'anim.gif'])).status).toBe(415);
  });

  it('refuses a file over MEDIA_MAX_BYTES with 413', async () => {
    const noisy = await sharp(randomBytes(600 * 600 * 3), { raw: { width: 600, height: 600, channels: 3 } }).png().toBuffer();
    expect(noisy.length).toBeGreaterThan(MAX_BYTES);
    const res = await upload([noisy, 'noise.png']);
    expect(res.status).toBe(413);
    expect(res.body.statusCode).toBe(413);
  });

  it('refuses an image over MEDIA_MAX_PIXELS with 422: a big flat image, and a small PNG whose header declares 50 000 × 50 000', async () => {
    const flat = await sharp({ create: { width: 2500, height: 2000, channels: 3, background: '#808080' } }).png().toBuffer();
    expect(flat.length).toBeLessThan(MAX_BYTES);
    const big = await upload([flat, 'flat.png']);
    expect(big.status).toBe(422);
    expect(big.body.message).toMatch(/2500 × 2000 pixels/);

    const bomb = await sharp({ create: { width: 16, height: 16, channels: 3, background: '#000' } }).png().toBuffer();
    // IHDR starts at byte 8: length, "IHDR", width, height, …, then a CRC over type and data.
    bomb.writeUInt32BE(50_000, 16);
    bomb.writeUInt32BE(50_000, 20);
    bomb.writeUInt32BE(crc32(bomb.subarray(12, 29)), 29);
    const res = await upload([bomb, 'tiny.png']);
    expect(res.status).toBe(422);
    expect(res.body.message).toMatch(/50000 × 50000 pixels/);
  });

  it('refuses a translator with 403', async () => {
    const translator = await signedInAs(t, 'translator');
    const res = await request(t.http).post('/api/media').set(translator).attach('file', await picture(10, 10).png().toBuffer(), 'x.png');
    expect(res.status).toBe(403);
  });
});

describe('renditions as a queued job', () => {
  it('answers an upload at once with the original kept and the renditions pending, and shows them ready once the worker has made them', async () => {
    const res = await upload([await picture(900, 600).png().toBuffer(), 'queued.png']);
    expect(res.status).toBe(201);
    const [asset] = res.body;
    expect(asset).toMatchObject({ renditions: [], renditionStatus: { state: 'pending', progress: 0, failure: null } });
    expect(fs.existsSync(storedOriginal(asset.sha256))).toBe(true);
    expect(fs.existsSync(path.join(mediaDir, 'renditions', asset.sha256))).toBe(false);
    expect((await request(t.http).get(`/api/media/${asset.id}`).set(curator)).body.renditionStatus.state).toBe('pending');

    const ready = await prepared(asset);
    expect(ready).toMatchObject({ renditionStatus: { state: 'ready', progress: 1, failure: null } });
    expect(ready.renditions.map((r: { width: number }) => r.width)).toEqual([640, 900]);
    expect((await request(t.http).get(ready.renditions[0].url)).status).toBe(200);
  });

  it('keeps a failure with its reason, and makes the renditions when a curator retries once the cause is gone', async () => {
    const good = await picture(700, 500).png().toBuffer();
    const [asset] = (await upload([good, 'will-fail.png'])).body;
    // The kept original is damaged after the upload (a disk fault): the worker cannot decode it.
    fs.writeFileSync(storedOriginal(asset.sha256), truncated(fs.readFileSync(storedOriginal(asset.sha256))));
    expect(await prepareRenditions(t, asset.id)).toBe('failed');
    const failed = (await request(t.http).get(`/api/media/${asset.id}`).set(curator)).body;
    expect(failed).toMatchObject({ renditions: [], renditionStatus: { state: 'failed', failure: expect.stringMatching(/^The WebP renditions could not be made: /) } });

    fs.writeFileSync(storedOriginal(asset.sha256), await sharp(good).png().toBuffer());
    const retried = await request(t.http).post(`/api/media/${asset.id}/renditions/retry`).set(curator);
    expect({ status: retried.status, body: retried.body }).toEqual({ status: 202, body: { state: 'pending', progress: 0, failure: null } });
    const again = await request(t.http).post(`/api/media/${asset.id}/renditions/retry`).set(curator);
    expect(again.status).toBe(409);
    expect(again.body.message).toMatch(/being prepared/);
    expect((await prepared(asset)).renditionStatus).toEqual({ state: 'ready', progress: 1, failure: null });
    expect((await request(t.http).post(`/api/media/${asset.id}/renditions/retry`).set(curator)).status).toBe(409);
  });

  it('answers a retry of an image that does not exist with 404, and one by an educator with 403', async () => {
    expect((await request(t.http).post('/api/media/2147483000/renditions/retry').set(curator)).status).toBe(404);
    const educator = await signedInAs(t, 'educator');
    expect((await request(t.http).post('/api/media/2147483000/renditions/retry').set(educator)).status).toBe(403);
  });
});

describe('details, lists and delete', () => {
  it('sets credit, licence, expiry and alt text; removes an alt text set to ""', async () => {
    const [asset] = (await upload([await picture(200, 100).png().toBuffer(), 'rights.png'])).body;
    const set = await request(t.http).patch(`/api/media/${asset.id}`).set(curator).send({
      credit: 'Illustration: Suite Studio', licence: { kind: 'spdx', id: 'CC-BY-4.0' }, licenceExpiresOn: '2030-06-30', alt: { en: 'A red box', fr: 'Une boîte rouge' },
    });
    expect(set.body).toMatchObject({ credit: 'Illustration: Suite Studio', licence: { kind: 'spdx', id: 'CC-BY-4.0' }, licenceExpiresOn: '2030-06-30', alt: { en: 'A red box', fr: 'Une boîte rouge' } });
    const changed = await request(t.http).patch(`/api/media/${asset.id}`).set(curator).send({ licence: { kind: 'all-rights-reserved', holder: 'Suite Studio' }, alt: { fr: '' } });
    expect(changed.body).toMatchObject({ licence: { kind: 'all-rights-reserved', holder: 'Suite Studio' }, alt: { en: 'A red box' } });
  });

  it('refuses a licence id that is not on the SPDX list', async () => {
    const [asset] = (await upload([await picture(50, 50).png().toBuffer(), 'x.png'])).body;
    const res = await request(t.http).patch(`/api/media/${asset.id}`).set(curator).send({ licence: { kind: 'spdx', id: 'Free-ish' } });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ path: ['licence'], message: expect.stringMatching(/SPDX/) }]);
  });

  it('lists assets missing alt text or credit, and licences ending soon', async () => {
    const [bare] = (await upload([await picture(60, 60).png().toBuffer(), 'bare-filter.png'])).body;
    const [done] = (await upload([await picture(60, 60).png().toBuffer(), 'done-filter.png'])).body;
    const soon = t.clock.fromNow(10 * 86_400_000).toISOString().slice(0, 10);
    await request(t.http).patch(`/api/media/${done.id}`).set(curator).send({ credit: 'Suite', alt: { en: 'Done' }, licenceExpiresOn: soon });
    const ids = async (query: string) => (await request(t.http).get(`/api/media?q=-filter&pageSize=100&${query}`).set(curator)).body.items.map((a: { id: number }) => a.id);
    expect(await ids('missing=alt')).toEqual([bare.id]);
    expect(await ids('missing=credit')).toEqual([bare.id]);
    expect(await ids('expiringWithinDays=30')).toEqual([done.id]);
    expect(await ids('expiringWithinDays=5')).toEqual([]);
    expect(await ids('sort=filename')).toEqual([bare.id, done.id]);
  });

  it('refuses to delete an image a panel shows, saying where, and deletes it once the panel no longer does', async () => {
    const asset = await prepared((await upload([await picture(80, 80).png().toBuffer(), 'used.png'])).body[0]);
    const story = (await request(t.http).post('/api/stories').set(curator).send({ title: 'Uses an image', venueId })).body;
    const panel = (await request(t.http).post(`/api/stories/${story.id}/panels`).set(curator).send({ doc: { type: 'doc', content: [{ type: 'panelImage', attrs: { mediaId: String(asset.id) } }] } })).body;
    expect((await request(t.http).get(`/api/media/${asset.id}`).set(curator)).body.usedIn).toEqual([{ storyId: story.id, storyTitle: 'Uses an image', panelId: panel.id, panelNumber: 1 }]);

    const refused = await request(t.http).delete(`/api/media/${asset.id}`).set(curator);
    expect(refused.status).toBe(409);
    expect(refused.body.message).toMatch(/"Uses an image"/);

    await request(t.http).put(`/api/panels/${panel.id}`).set(curator).send({ doc: { type: 'doc', content: [{ type: 'paragraph' }] }, version: 1 });
    expect((await request(t.http).delete(`/api/media/${asset.id}`).set(curator)).status).toBe(204);
    // The library no longer has it; its files go when the deletion's grace ends (restorable-deletions.spec.ts).
    expect((await request(t.http).get(`/api/media/${asset.id}`).set(curator)).status).toBe(404);
  });
});
