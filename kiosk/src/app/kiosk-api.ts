import createClient, { type Client } from 'openapi-fetch';
import type { components, paths } from '@mantlepiece/shared/api';
import type {
  EventsResponse, HeartbeatBody, KioskCredential, KioskEvent, KioskManifestResponse, PairStartResponse,
} from '@mantlepiece/shared/kiosk';

/** The public view of a venue: its name and languages, for the screens a kiosk shows before it plays. */
export type KioskVenue = components['schemas']['KioskVenueView'];

/** A server answer the kiosk did not expect; `status` 0 when the server could not be reached. */
export class KioskApiError extends Error {
  constructor(readonly status: number, message: string) {
    super(message);
  }
}

export type ManifestAnswer =
  | { status: 'unchanged' }
  | { status: 'none' }
  | { status: 'release'; body: KioskManifestResponse; etag: string | null };

export type PairAnswer = { status: 'waiting' } | { status: 'expired' } | { status: 'paired'; credential: KioskCredential };

export type Fetch = typeof fetch;

/** Pairing is how a kiosk gets its device token, so these routes never carry one. */
const PAIRING_ROUTES = '/api/kiosk/pair/';

const JSON_ANSWER = { Accept: 'application/json' };

/**
 * Every route the kiosk calls (issue 7 contract), typed from the API's OpenAPI document
 * (`@mantlepiece/shared/api`), in one place: nothing else calls fetch.
 */
export class KioskApi {
  private deviceToken: string | null = null;
  private unpaired: (() => void) | null = null;
  private readonly client: Client<paths>;

  constructor(private readonly fetchImpl: Fetch = (input, init) => fetch(input, init), origin = '') {
    this.client = createClient<paths>({
      // Absolute, because a Request outside a page (unit tests) has no base to resolve a path against.
      baseUrl: origin || globalThis.location.origin,
      cache: 'no-store',
      fetch: (request) => this.send(request),
    });
  }

  useDeviceToken(token: string | null): void {
    this.deviceToken = token;
  }

  /**
   * `listener` runs when the server refuses the device token (401 or 403): a technician revoked
   * this kiosk, and no later call will be answered either.
   */
  whenUnpaired(listener: (() => void) | null): void {
    this.unpaired = listener;
  }

  private async send(request: Request): Promise<Response> {
    const { pathname, search } = new URL(request.url);
    const withToken = this.deviceToken !== null && !pathname.startsWith(PAIRING_ROUTES);
    if (withToken) request.headers.set('Authorization', `Bearer ${this.deviceToken}`);
    let response: Response;
    try {
      response = await this.fetchImpl(request);
    } catch (error) {
      throw new KioskApiError(0, `${request.method} ${pathname}${search} could not reach the server (${(error as Error).message}).`);
    }
    if (withToken && (response.status === 401 || response.status === 403)) this.unpaired?.();
    return response;
  }

  /**
   * The venue to show: a paired kiosk's own; unpaired, the one `slug` names, else the only venue
   * there is. Null when the server names none (several venues, none named).
   */
  async venue(slug: string | null = null): Promise<KioskVenue | null> {
    const { data, response } = await this.client.GET('/api/kiosk/venue', { params: { query: { slug: slug || undefined } }, headers: JSON_ANSWER });
    if (response.status === 204) return null;
    if (response.status !== 200 || data === undefined) throw unexpected('GET /api/kiosk/venue', response);
    return data;
  }

  async startPairing(): Promise<PairStartResponse> {
    const { data, response } = await this.client.POST('/api/kiosk/pair/start', { headers: JSON_ANSWER });
    if ((response.status !== 200 && response.status !== 201) || data === undefined) throw unexpected('POST /api/kiosk/pair/start', response);
    return data;
  }

  async completePairing(pollToken: string): Promise<PairAnswer> {
    const { data, response } = await this.client.POST('/api/kiosk/pair/complete', { body: { pollToken } });
    if (response.status === 202) return { status: 'waiting' };
    if (response.status === 410) return { status: 'expired' };
    if (response.status !== 200 || data === undefined) throw unexpected('POST /api/kiosk/pair/complete', response);
    return 'deviceToken' in data ? { status: 'paired', credential: data } : { status: 'waiting' };
  }

  async manifest(etag: string | null): Promise<ManifestAnswer> {
    const { data, response } = await this.client.GET('/api/kiosk/manifest', { headers: etag ? { 'If-None-Match': etag } : {} });
    if (response.status === 304) return { status: 'unchanged' };
    if (response.status === 204) return { status: 'none' };
    if (response.status !== 200 || data === undefined) throw unexpected('GET /api/kiosk/manifest', response);
    return { status: 'release', body: data, etag: response.headers.get('ETag') };
  }

  /** A release file from byte `from` on (a Range request when resuming); its body is left to the caller to read. */
  async file(sha256: string, from: number): Promise<Response> {
    const { response } = await this.client.GET('/api/kiosk/files/{sha256}', {
      params: { path: { sha256 } },
      headers: from > 0 ? { Range: `bytes=${from}-` } : {},
      parseAs: 'stream',
    });
    if (response.status !== 200 && response.status !== 206) throw unexpected(`GET /api/kiosk/files/${sha256}`, response);
    return response;
  }

  async heartbeat(body: HeartbeatBody): Promise<void> {
    const { response } = await this.client.POST('/api/kiosk/heartbeat', { body });
    if (!response.ok) throw unexpected('POST /api/kiosk/heartbeat', response);
  }

  async events(events: KioskEvent[]): Promise<EventsResponse> {
    const { data, response } = await this.client.POST('/api/kiosk/events', { body: { events }, headers: JSON_ANSWER });
    if (response.status !== 200 || data === undefined) throw unexpected('POST /api/kiosk/events', response);
    return data;
  }
}

function unexpected(call: string, response: Response): KioskApiError {
  return new KioskApiError(response.status, `${call} answered ${response.status}.`);
}
