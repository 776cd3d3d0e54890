import { randomBytes } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import type { MediaStore } from './media-store.js';

const KEY = /^[a-z]+(\/[A-Za-z0-9._-]+)+$/;

/** Media under one folder (MEDIA_DIR). Writes go to a temporary name and are renamed into place, so a reader never sees half a file. */
export class LocalMediaStore implements MediaStore {
  constructor(private readonly root: string) {}

  async put(key: string, data: Buffer): Promise<void> {
    const file = this.fileOf(key);
    await fs.mkdir(path.dirname(file), { recursive: true });
    const partial = `${file}.${randomBytes(6).toString('hex')}.partial`;
    await fs.writeFile(partial, data);
    await fs.rename(partial, file);
  }

  async get(key: string): Promise<Buffer | null> {
    try {
      return await fs.readFile(this.fileOf(key));
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw error;
    }
  }

  async exists(key: string): Promise<boolean> {
    try {
      await fs.access(this.fileOf(key));
      return true;
    } catch {
      return false;
    }
  }

  async remove(key: string): Promise<void> {
    await fs.rm(this.fileOf(key), { force: true });
  }

  /** Keys come from our own code, but a key that could climb out of the root is refused anyway. */
  private fileOf(key: string): string {
    if (!KEY.test(key) || key.split('/').some((part) => part === '..' || part === '.')) throw new Error(`not a media key: ${key}`);
    return path.join(this.root, ...key.split('/'));
  }
}
