import type {
  EventsBody, EventsResponse, HeartbeatBody, KioskCredential, KioskEvent, KioskManifestResponse, PairCompleteWaiting, PairStartResponse,
} from '@mantlepiece/shared/kiosk';

/** The public view of a venue: its name and languages, for the screens a kiosk shows before it plays. */
export interface KioskVenue {
  name: string;
  locales: string[];
}

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

/** Every route the kiosk calls (issue 7 contract), in one place: nothing else calls fetch. */
export class KioskApi {
  private deviceToken: string | null = null;
  private unpaired: (() => void) | null = null;

  constructor(private readonly fetchImpl: Fetch = (input, init) => fetch(input, init), private readonly origin = '') {}

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

  private async send(path: string, init: RequestInit = {}): Promise<Response> {
    const headers = new Headers(init.headers);
    const withToken = this.deviceToken !== null && !path.startsWith('/api/kiosk/pair/');
    if (withToken) headers.set('Authorization', `Bearer ${this.deviceToken}`);
    if (init.body !== undefined) headers.set('Content-Type', 'application/json');
    let response: Response;
    try {
      response = await this.fetchImpl(`${this.origin}${path}`, { ...init, headers, cache: 'no-store' });
    } catch (error) {
      throw new KioskApiError(0, `${init.method ?? 'GET'} ${path} could not reach the server (${(error as Error).message}).`);
    }
    if (withToken && (response.status === 401 || response.status === 403)) this.unpaired?.();
    return response;
  }

  private async json<T>(path: string, init: RequestInit = {}, expected: number[] = [200]): Promise<{ status: number; body: T }> {
    const response = await this.send(path, { ...init, headers: { Accept: 'application/json', ...init.headers } });
    if (!expected.includes(response.status)) throw new KioskApiError(response.status, `${init.method ?? 'GET'} ${path} answered ${response.status}.`);
    return { status: response.status, body: (await response.json()) as T };
  }

  /**
   * The venue to show: a paired kiosk's own; unpaired, the one `slug` names, else the only venue
   * there is. Null when the server names none (several venues, none named).
   */
  async venue(slug: string | null = null): Promise<KioskVenue | null> {
    const path = `/api/kiosk/venue${slug ? `?slug=${encodeURIComponent(slug)}` : ''}`;
    const response = await this.send(path, { headers: { Accept: 'application/json' } });
    if (response.status === 204) return null;
    if (response.status !== 200) throw new KioskApiError(response.status, `GET ${path} answered ${response.status}.`);
    return (await response.json()) as KioskVenue;
  }

  async startPairing(): Promise<PairStartResponse> {
    return (await this.json<PairStartResponse>('/api/kiosk/pair/start', { method: 'POST', body: '{}' }, [200, 201])).body;
  }

  async completePairing(pollToken: string): Promise<PairAnswer> {
    const response = await this.send('/api/kiosk/pair/complete', { method: 'POST', body: JSON.stringify({ pollToken }) });
    if (response.status === 202) return { status: 'waiting' };
    if (response.status === 410) return { status: 'expired' };
    if (response.status !== 200) throw new KioskApiError(response.status, `POST /api/kiosk/pair/complete answered ${response.status}.`);
    const body = (await response.json()) as KioskCredential | PairCompleteWaiting;
    return 'deviceToken' in body ? { status: 'paired', credential: body } : { status: 'waiting' };
  }

  async manifest(etag: string | null): Promise<ManifestAnswer> {
    const response = await this.send('/api/kiosk/manifest', { headers: etag ? { 'If-None-Match': etag } : {} });
    if (response.status === 304) return { status: 'unchanged' };
    if (response.status === 204) return { status: 'none' };
    if (response.status !== 200) throw new KioskApiError(response.status, `GET /api/kiosk/manifest answered ${response.status}.`);
    return { status: 'release', body: (await response.json()) as KioskManifestResponse, etag: response.headers.get('ETag') };
  }

  /** A release file from byte `from` on (a Range request when resuming). */
  async file(sha256: string, from: number): Promise<Response> {
    const response = await this.send(`/api/kiosk/files/${sha256}`, { headers: from > 0 ? { Range: `bytes=${from}-` } : {} });
    if (response.status !== 200 && response.status !== 206) throw new KioskApiError(response.status, `GET /api/kiosk/files/${sha256} answered ${response.status}.`);
    return response;
  }

  async heartbeat(body: HeartbeatBody): Promise<void> {
    const response = await this.send('/api/kiosk/heartbeat', { method: 'POST', body: JSON.stringify(body) });
    if (!response.ok) throw new KioskApiError(response.status, `POST /api/kiosk/heartbeat answered ${response.status}.`);
  }

  async events(events: KioskEvent[]): Promise<EventsResponse> {
    return (await this.json<EventsResponse>('/api/kiosk/events', { method: 'POST', body: JSON.stringify({ events } satisfies EventsBody) })).body;
  }
}
