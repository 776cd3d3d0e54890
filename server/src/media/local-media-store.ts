import { randomBytes } from 'node:crypto';
import { createReadStream, createWriteStream } from 'node:fs';
import fs from 'node:fs/promises';
import path from 'node:path';
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { checkedKey, type ByteRange, type MediaStore, type OpenedObject } from './media-store.js';

/** Media under one folder (MEDIA_DIR). Writes go to a temporary name and are renamed into place, so a reader never sees half a file. */
export class LocalMediaStore implements MediaStore {
  constructor(private readonly root: string) {}

  async put(key: string, data: Buffer | Readable): Promise<void> {
    const file = this.fileOf(key);
    await fs.mkdir(path.dirname(file), { recursive: true });
    const partial = `${file}.${randomBytes(6).toString('hex')}.partial`;
    try {
      await pipeline(Buffer.isBuffer(data) ? Readable.from([data]) : data, createWriteStream(partial));
      await fs.rename(partial, file);
    } catch (error) {
      await fs.rm(partial, { force: true });
      throw error;
    }
  }

  async get(key: string): Promise<Buffer | null> {
    return absentAsNull(() => fs.readFile(this.fileOf(key)));
  }

  async open(key: string, range?: ByteRange): Promise<OpenedObject | null> {
    const handle = await absentAsNull(() => fs.open(this.fileOf(key)));
    if (!handle) return null;
    try {
      const { size } = await handle.stat();
      // The stream owns the handle from here and closes it at its end, or when it is destroyed.
      const body = createReadStream('', { fd: handle, start: range?.start, end: range?.end });
      return { size, body, range };
    } catch (error) {
      await handle.close();
      throw error;
    }
  }

  async size(key: string): Promise<number | null> {
    return (await absentAsNull(() => fs.stat(this.fileOf(key))))?.size ?? null;
  }

  async exists(key: string): Promise<boolean> {
    return (await this.size(key)) !== null;
  }

  async remove(key: string): Promise<void> {
    await fs.rm(this.fileOf(key), { force: true });
  }

  /** The disk has no URLs of its own: the server sends the bytes. */
  presignedUrl(): Promise<null> {
    return Promise.resolve(null);
  }

  private fileOf(key: string): string {
    return path.join(this.root, ...checkedKey(key).split('/'));
  }
}

async function absentAsNull<T>(read: () => Promise<T>): Promise<T | null> {
  try {
    return await read();
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
    throw error;
  }
}
