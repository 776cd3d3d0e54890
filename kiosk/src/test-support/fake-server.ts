import type { PairStartResponse } from '@mantlepiece/shared/kiosk';
import type { Fetch, KioskVenue } from '../app/kiosk-api';
import type { FixtureRelease } from './release-fixture';

export interface RecordedRequest {
  method: string;
  path: string;
  search: string;
  headers: Headers;
  cache: RequestCache;
  body: unknown;
}

/**
 * The kiosk routes of the issue 7 contract, answered in memory at the fetch boundary, with knobs
 * for what a real network does: go away, cut a download short, serve bytes that were changed.
 */
export class FakeKioskServer {
  live: FixtureRelease | null = null;
  reachable = true;
  /** Bytes after which a file download breaks off, once per file. */
  cutAfter = new Map<string, number>();
  /** Files whose served bytes differ from what the manifest says. */
  tampered = new Set<string>();
  /** A technician revoked the kiosk: every device-token route answers 401, as the server's guard does. */
  revoked = false;
  pairing: { start: PairStartResponse[]; completes: Array<{ status: number; body?: unknown }> } = { start: [], completes: [] };
  /** `GET /api/kiosk/venue`: the venue a paired kiosk (its token sent) is answered, and those named by slug; none answers 204. */
  venues: { paired?: KioskVenue; bySlug: Record<string, KioskVenue> } = { bySlug: {} };
  readonly requests: RecordedRequest[] = [];

  readonly fetch: Fetch = async (input, init) => {
    const request = new Request(input, init);
    const url = new URL(request.url);
    const recorded: RecordedRequest = { method: request.method, path: url.pathname, search: url.search, headers: request.headers, cache: request.cache, body: undefined };
    // Recorded as it is sent, so the order of requests is the order of calls; the body follows.
    this.requests.push(recorded);
    const text = await request.text();
    recorded.body = text ? JSON.parse(text) as unknown : undefined;
    if (!this.reachable) throw new TypeError('Failed to fetch');
    return this.answer(request.method, url.pathname, request.headers, url.searchParams);
  };

  private answer(method: string, path: string, headers: Headers, query: URLSearchParams): Response {
    const json = (status: number, value?: unknown, extra: HeadersInit = {}) =>
      new Response(value === undefined ? null : JSON.stringify(value), { status, headers: { 'Content-Type': 'application/json', ...extra } });
    if (method === 'POST' && path === '/api/kiosk/pair/start') return json(201, this.pairing.start.shift());
    if (method === 'POST' && path === '/api/kiosk/pair/complete') {
      const next = this.pairing.completes.shift() ?? { status: 202, body: { status: 'waiting' } };
      return json(next.status, next.body);
    }
    if (this.revoked && !path.startsWith('/api/kiosk/pair/')) return json(401, { statusCode: 401, message: 'Pair this kiosk to continue.' });
    if (method === 'GET' && path === '/api/kiosk/venue') {
      const venue = headers.has('Authorization') ? this.venues.paired : this.venues.bySlug[query.get('slug') ?? ''];
      return venue ? json(200, venue) : new Response(null, { status: 204 });
    }
    if (method === 'GET' && path === '/api/kiosk/manifest') {
      if (!this.live) return new Response(null, { status: 204 });
      const { etag } = this.live;
      if (headers.get('If-None-Match') === etag) return new Response(null, { status: 304 });
      return json(200, this.live.response, { ETag: etag });
    }
    const file = /^\/api\/kiosk\/files\/([0-9a-f]{64})$/.exec(path);
    if (method === 'GET' && file) return this.serveFile(file[1]!, headers.get('Range'));
    if (method === 'POST' && (path === '/api/kiosk/heartbeat')) return new Response(null, { status: 204 });
    if (method === 'POST' && path === '/api/kiosk/events') return json(200, { stored: 0, duplicates: 0, dropped: 0 });
    return json(404, { statusCode: 404, message: `Nothing is served at ${path}.` });
  }

  private serveFile(sha256: string, range: string | null): Response {
    let bytes = this.live?.files.get(sha256);
    if (!bytes) return new Response(null, { status: 404 });
    if (this.tampered.has(sha256)) {
      bytes = bytes.slice();
      bytes[bytes.length - 1] = (bytes[bytes.length - 1]! + 1) % 256;
    }
    const start = range ? Number(/^bytes=(\d+)-$/.exec(range)?.[1] ?? 0) : 0;
    const rest = bytes.subarray(start);
    const cut = this.cutAfter.get(sha256);
    if (cut !== undefined) this.cutAfter.delete(sha256);
    const piece = 64 * 1024;
    let at = 0;
    // Sent in pieces as a reader asks, as a network does, and broken off after `cut` bytes when asked.
    const stream = new ReadableStream<Uint8Array>({
      pull(controller) {
        if (at >= rest.byteLength) return controller.close();
        if (cut !== undefined && at >= cut) return controller.error(new TypeError('network error'));
        const end = Math.min(at + piece, rest.byteLength, cut ?? Infinity);
        controller.enqueue(rest.slice(at, end));
        at = end;
      },
    });
    const headers: Record<string, string> = { 'Content-Type': 'image/webp', 'Cache-Control': 'public, max-age=31536000, immutable' };
    if (start > 0) headers['Content-Range'] = `bytes ${start}-${bytes.byteLength - 1}/${bytes.byteLength}`;
    return new Response(stream, { status: start > 0 ? 206 : 200, headers });
  }

  requestsTo(path: string): RecordedRequest[] {
    return this.requests.filter((request) => request.path === path);
  }
}
