import { HttpStatus } from '@nestjs/common';
import { pipeline } from 'node:stream/promises';
import type { Request, Response } from 'express';
import type { ByteRange, MediaStore, OpenedObject } from './media-store.js';

/** One stored object, however it is kept. */
export interface StoredObjectSource {
  size(): Promise<number | null>;
  open(range?: ByteRange): Promise<OpenedObject | null>;
}

export const storedObject = (store: MediaStore, key: string): StoredObjectSource => ({
  size: () => store.size(key),
  open: (range) => store.open(key, range),
});

/** Named by content, so what a URL answers never changes: browsers, kiosks and a CDN may keep it a year. */
export const IMMUTABLE = 'public, max-age=31536000, immutable';

/**
 * Streams a stored object, the whole of it or the one byte range asked for (RFC 9110 §14), never
 * holding it in memory. Answers false, having sent nothing, when the object is not there.
 */
export async function sendStoredObject(req: Request, res: Response, source: StoredObjectSource, headers: Record<string, string>): Promise<boolean> {
  const head = req.method === 'HEAD';
  // A plain GET opens the object at once and takes its size from there: one look-up in the store, not two.
  const plain = !head && !req.headers.range ? await source.open() : undefined;
  const size = plain === undefined ? await source.size() : (plain?.size ?? null);
  if (size === null) return false;
  const ranges = req.headers.range ? req.range(size, { combine: true }) : undefined;
  if (ranges === -1) {
    res.status(HttpStatus.REQUESTED_RANGE_NOT_SATISFIABLE).set({ ...headers, 'Content-Range': `bytes */${size}` }).end();
    return true;
  }
  // Several ranges would need a multipart answer; a client that asks for them gets the whole file, as RFC 9110 allows.
  const range = Array.isArray(ranges) && ranges.type === 'bytes' && ranges.length === 1 ? ranges[0]! : undefined;
  const opened = plain ?? (head ? null : await source.open(range));
  if (!head && !opened) return false;
  res.set({ ...headers, 'Accept-Ranges': 'bytes' });
  if (range) res.status(HttpStatus.PARTIAL_CONTENT).set({ 'Content-Range': `bytes ${range.start}-${range.end}/${size}`, 'Content-Length': String(range.end - range.start + 1) });
  else res.set('Content-Length', String(size));
  if (!opened) {
    res.end();
    return true;
  }
  // A client that goes away mid-file ends the stream; there is nobody left to answer.
  await pipeline(opened.body, res).catch(() => res.destroy());
  return true;
}
