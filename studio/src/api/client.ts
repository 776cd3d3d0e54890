import type { ApiErrorBody, SessionView } from '@mantlepiece/shared';

/** An API answer other than 2xx, with the server's field-by-field `errors` kept for forms. */
export class ApiError extends Error {
  readonly status: number;
  readonly errors: NonNullable<ApiErrorBody['errors']>;
  /** The whole error body, for answers that carry more than a message (a 409 with the current version). */
  readonly body: unknown;

  constructor(status: number, body: Pick<ApiErrorBody, 'message' | 'errors'>) {
    super(body.message);
    this.name = 'ApiError';
    this.status = status;
    this.errors = body.errors ?? [];
    this.body = body;
  }

  /** The server's message for one form field (the first segment of each error's path). */
  fieldMessage(field: string): string | undefined {
    return this.errors.find((error) => String(error.path[0]) === field)?.message;
  }
}

/** Status 0 stands for "no answer at all" (offline, server down, proxy refused). */
export const NETWORK_FAILURE = 0;

type SessionListener = (session: SessionView | null) => void;

// The access token lives in memory only; the refresh token is an httpOnly cookie the page never sees.
let accessToken: string | null = null;
let refreshing: Promise<SessionView | null> | null = null;
const listeners = new Set<SessionListener>();

export function onSessionChange(listener: SessionListener): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function setSession(session: SessionView | null): void {
  accessToken = session?.accessToken ?? null;
  for (const listener of listeners) listener(session);
}

export type Query = Record<string, string | number | boolean | undefined | null>;

interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  query?: Query;
  /** A media type other than JSON, for a download (the audit trail as CSV). */
  accept?: string;
  /** A body sent as it is under its own media type (an XLIFF file), instead of JSON. */
  file?: { type: string; content: Blob | string };
}

function url(path: string, query?: Query): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const search = params.toString();
  return `/api${path}${search ? `?${search}` : ''}`;
}

async function send(path: string, options: RequestOptions): Promise<Response> {
  const headers: Record<string, string> = { Accept: options.accept ?? 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  if (options.file) headers['Content-Type'] = options.file.type;
  if (accessToken) headers.Authorization = `Bearer ${accessToken}`;
  try {
    return await fetch(url(path, options.query), {
      method: options.method ?? 'GET',
      headers,
      body: options.file ? options.file.content : options.body === undefined ? undefined : JSON.stringify(options.body),
      credentials: 'same-origin',
    });
  } catch {
    throw new ApiError(NETWORK_FAILURE, { message: 'network' });
  }
}

/** The bearer header for the one request fetch cannot make: an upload that reports its progress. */
export const authorizationHeader = (): Record<string, string> => (accessToken ? { Authorization: `Bearer ${accessToken}` } : {});

async function read<T>(response: Response): Promise<T> {
  const text = await response.text();
  const body: unknown = text ? safeJson(text) : undefined;
  if (response.ok) return body as T;
  const error = body && typeof body === 'object' && 'message' in body ? (body as ApiErrorBody) : { message: response.statusText };
  throw new ApiError(response.status, error);
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/**
 * Trades the refresh cookie for a new session. Concurrent callers share one request, because the
 * server rotates the cookie on every refresh and a second refresh with the old one would fail.
 */
export function refreshSession(): Promise<SessionView | null> {
  refreshing ??= send('/auth/refresh', { method: 'POST' })
    // 204: no session cookie, nobody signed in; 401: the cookie was refused.
    .then(async (response) => (response.status === 204 || response.status === 401 ? null : read<SessionView>(response)))
    .then((session) => {
      setSession(session);
      return session;
    })
    .finally(() => {
      refreshing = null;
    });
  return refreshing;
}

// A 401 from these means the credentials themselves were refused; refreshing cannot help.
const CREDENTIAL_PATHS = new Set(['/auth/login', '/auth/refresh', '/auth/logout']);

/** Sends a request; a 401 on a signed-in call gets one retry after a refresh. */
async function sendSignedIn(path: string, options: RequestOptions): Promise<Response> {
  const signedIn = accessToken !== null;
  const response = await send(path, options);
  if (response.status === 401 && signedIn && !CREDENTIAL_PATHS.has(path)) {
    const session = await refreshSession();
    if (session) return send(path, options);
  }
  return response;
}

/** Calls the API and reads its JSON answer. */
export async function api<T>(path: string, options: RequestOptions = {}): Promise<T> {
  return read<T>(await sendSignedIn(path, options));
}

/** Calls the API for a file (`accept` names its type); a refusal still arrives as an ApiError. */
export async function apiFile(path: string, options: RequestOptions & { accept: string }): Promise<Blob> {
  const response = await sendSignedIn(path, options);
  if (!response.ok) return read<never>(response);
  return response.blob();
}
