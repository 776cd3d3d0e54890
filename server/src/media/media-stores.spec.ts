import { createHash, randomBytes } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Readable } from 'node:stream';
import { afterAll, describe, expect, it } from 'vitest';
import { s3StandInSettings } from '../../test/s3-stand-in.js';
import { LocalMediaStore } from './local-media-store.js';
import { originalKey, type MediaStore } from './media-store.js';
import { S3MediaStore } from './s3-media-store.js';

const folders: string[] = [];
afterAll(() => folders.forEach((folder) => fs.rmSync(folder, { recursive: true, force: true })));

function diskStore(): MediaStore {
  const folder = fs.mkdtempSync(path.join(os.tmpdir(), 'mantlepiece-store-'));
  folders.push(folder);
  return new LocalMediaStore(folder);
}

const freshKey = () => originalKey(randomBytes(32).toString('hex'));
const sha256 = (data: Buffer) => createHash('sha256').update(data).digest('hex');

async function bytesOf(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

/** `total` pseudo-random bytes, made chunk by chunk as they are read, and their SHA-256. */
function generated(total: number): { stream: Readable; sha256: Promise<string> } {
  const hash = createHash('sha256');
  let resolve!: (hex: string) => void;
  const digest = new Promise<string>((done) => (resolve = done));
  let sent = 0;
  const stream = new Readable({
    read() {
      if (sent === total) {
        resolve(hash.digest('hex'));
        this.push(null);
        return;
      }
      const chunk = randomBytes(Math.min(256 * 1024, total - sent));
      sent += chunk.length;
      hash.update(chunk);
      this.push(chunk);
    },
  });
  return { stream, sha256: digest };
}

/** One contract, run against every store the server can be given. */
describe.each([
  { name: 'the local disk', store: diskStore, presigns: false },
  { name: 'S3-compatible storage (the S3 stand-in)', store: () => new S3MediaStore(s3StandInSettings()), presigns: true },
])('media store on $name', ({ store: makeStore, presigns }) => {
  const store = makeStore();

  it('gives back the bytes it was given, with their size', async () => {
    const key = freshKey();
    const data = randomBytes(70_000);
    await store.put(key, data, 'image/webp');
    expect(await store.exists(key)).toBe(true);
    expect(await store.size(key)).toBe(data.length);
    expect(sha256((await store.get(key))!)).toBe(sha256(data));
    const opened = (await store.open(key))!;
    expect(opened.size).toBe(data.length);
    expect(sha256(await bytesOf(opened.body))).toBe(sha256(data));
  });

  it('answers null for a key it does not hold', async () => {
    const key = freshKey();
    expect(await store.get(key)).toBeNull();
    expect(await store.open(key)).toBeNull();
    expect(await store.size(key)).toBeNull();
    expect(await store.exists(key)).toBe(false);
  });

  it('stores a stream larger than one multipart part without gathering it first', async () => {
    const key = freshKey();
    const total = 11 * 1024 * 1024 + 123;
    const { stream, sha256: expected } = generated(total);
    await store.put(key, stream);
    expect(await store.size(key)).toBe(total);
    expect(sha256(await bytesOf((await store.open(key))!.body))).toBe(await expected);
  });

  it('reads one byte range, both ends included, and still tells the whole size', async () => {
    // RFC 9110 §14.1.2: "bytes=500-999" is the second 500 bytes; first and last positions are inclusive.
    const key = freshKey();
    const data = randomBytes(4096);
    await store.put(key, data);
    const opened = (await store.open(key, { start: 500, end: 999 }))!;
    expect(opened.size).toBe(4096);
    expect(opened.range).toEqual({ start: 500, end: 999 });
    expect((await bytesOf(opened.body)).equals(data.subarray(500, 1000))).toBe(true);
  });

  it('replaces an object whole when the same key is put again', async () => {
    const key = freshKey();
    await store.put(key, randomBytes(5000));
    const second = randomBytes(300);
    await store.put(key, second);
    expect((await store.get(key))!.equals(second)).toBe(true);
  });

  it('keeps nothing of a stream that breaks off', async () => {
    const key = freshKey();
    let sent = 0;
    const failing = new Readable({
      read() {
        sent += 1;
        if (sent > 3) this.destroy(new Error('the upload broke off'));
        else this.push(randomBytes(64 * 1024));
      },
    });
    await expect(store.put(key, failing)).rejects.toThrow();
    expect(await store.exists(key)).toBe(false);
  });

  it('removes an object, and a second remove is no error', async () => {
    const key = freshKey();
    await store.put(key, randomBytes(10));
    await store.remove(key);
    expect(await store.exists(key)).toBe(false);
    await expect(store.remove(key)).resolves.toBeUndefined();
  });

  it('refuses a key that could climb out of its folder or bucket', async () => {
    await expect(store.put('originals/../../etc', randomBytes(1))).rejects.toThrow(/not a media key/);
    await expect(store.get('../outside')).rejects.toThrow(/not a media key/);
  });

  it(presigns ? 'gives a short-lived URL that serves the bytes, ranges included' : 'gives no URL of its own', async () => {
    const key = freshKey();
    const data = randomBytes(2048);
    await store.put(key, data, 'image/webp');
    const url = await store.presignedUrl(key, { contentType: 'image/webp', expiresInS: 60 });
    if (!presigns) {
      expect(url).toBeNull();
      return;
    }
    const whole = await fetch(url!);
    expect(whole.status).toBe(200);
    expect(whole.headers.get('content-type')).toBe('image/webp');
    expect(Buffer.from(await whole.arrayBuffer()).equals(data)).toBe(true);
    const part = await fetch(url!, { headers: { Range: 'bytes=1000-' } });
    expect(part.status).toBe(206);
    expect(Buffer.from(await part.arrayBuffer()).equals(data.subarray(1000))).toBe(true);
  });
});
