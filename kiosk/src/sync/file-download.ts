import { sha256HexOfBytes, type ReleaseFile } from '@mantlepiece/shared/kiosk';
import type { KioskApi } from '../app/kiosk-api';
import type { KioskStore } from '../storage/kiosk-store';

/** Written to storage in pieces this big, so a cut loses at most this much of a download. */
export const CHUNK_BYTES = 256 * 1024;

export type DownloadResult = { ok: true } | { ok: false; reason: string };

function concat(parts: readonly ArrayBuffer[] | readonly Uint8Array[]): Uint8Array<ArrayBuffer> {
  const views = parts.map((part) => (part instanceof Uint8Array ? part : new Uint8Array(part)));
  const out = new Uint8Array(views.reduce((sum, view) => sum + view.byteLength, 0));
  let at = 0;
  for (const view of views) {
    out.set(view, at);
    at += view.byteLength;
  }
  return out;
}

/** Where a 206 answer starts, from `Content-Range: bytes <start>-<end>/<size>`. */
function rangeStart(response: Response): number | null {
  const match = /^bytes (\d+)-/.exec(response.headers.get('Content-Range') ?? '');
  return match ? Number(match[1]) : null;
}

async function receive(api: KioskApi, store: KioskStore, file: ReleaseFile, from: number): Promise<void> {
  let response = await api.file(file.sha256, from);
  let offset = from;
  // A server that ignores Range, or answers another range, sends the file whole: start over.
  if (from > 0 && !(response.status === 206 && rangeStart(response) === from)) {
    await store.clearChunks(file.sha256);
    offset = 0;
    if (response.status !== 200) {
      await response.body?.cancel();
      response = await api.file(file.sha256, 0);
    }
  }
  if (!response.body) throw new Error(`GET /api/kiosk/files/${file.sha256} answered without a body.`);
  const reader = response.body.getReader();
  let buffered: Uint8Array[] = [];
  let bufferedBytes = 0;
  const flush = async () => {
    if (!bufferedBytes) return;
    const bytes = concat(buffered);
    buffered = [];
    bufferedBytes = 0;
    await store.putChunk({ sha256: file.sha256, offset, bytes: bytes.buffer });
    offset += bytes.byteLength;
  };
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      buffered.push(value);
      bufferedBytes += value.byteLength;
      if (bufferedBytes >= CHUNK_BYTES) await flush();
      if (offset + bufferedBytes > file.size) break;
    }
  } finally {
    // What arrived before a cut is kept, so the next attempt asks only for the rest.
    await flush();
  }
}

/**
 * Downloads one release file into storage, resuming from what an earlier attempt kept, and stores
 * it only when its bytes hash to the SHA-256 the signed manifest names.
 */
export async function downloadFile(api: KioskApi, store: KioskStore, file: ReleaseFile): Promise<DownloadResult> {
  let have = (await store.chunks(file.sha256)).reduce((sum, chunk) => sum + chunk.bytes.byteLength, 0);
  if (have > file.size) {
    await store.clearChunks(file.sha256);
    have = 0;
  }
  if (have < file.size) await receive(api, store, file, have);
  const bytes = concat((await store.chunks(file.sha256)).map((chunk) => chunk.bytes));
  await store.clearChunks(file.sha256);
  const actual = await sha256HexOfBytes(bytes);
  if (bytes.byteLength !== file.size || actual !== file.sha256) {
    return { ok: false, reason: `File ${file.sha256} came as ${bytes.byteLength} bytes hashing to ${actual}, not the ${file.size} bytes the manifest names.` };
  }
  await store.putFile({ sha256: file.sha256, mime: file.mime, bytes: bytes.buffer });
  return { ok: true };
}
