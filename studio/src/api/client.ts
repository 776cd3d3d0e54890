import createClient from 'openapi-fetch';
import type { ApiErrorBody } from '@mantlepiece/shared';
import type { components, paths } from '@mantlepiece/shared/api';

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

type SessionView = Schema<'SessionView'>;
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

/** A list goes as one comma-separated parameter (`?leaveOut=4,5`), as the server reads it. */
export type Query = Record<string, string | number | boolean | readonly (string | number)[] | undefined | null>;

interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  query?: Query;
  /** A media type other than JSON, for a download (the audit trail as CSV). */
  accept?: string;
  /** A body sent as it is under its own media type (an XLIFF file), instead of JSON. */
  file?: { type: string; content: Blob | string };
}

/** Query parameters as the server reads them: a parameter left empty (an empty list too) is left out. */
function searchOf(query: Query = {}): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    const text = value === undefined || value === null ? '' : String(value);
    if (text !== '') params.set(key, text);
  }
  return params.toString();
}

// Absolute, because a Request outside a page (unit tests) has no base to resolve a path against.
const origin = globalThis.location?.origin ?? 'http://localhost';

function url(path: string, query?: Query): string {
  const search = searchOf(query);
  return `${origin}/api${path}${search ? `?${search}` : ''}`;
}

function requestOf(path: string, options: RequestOptions): Request {
  const headers: Record<string, string> = { Accept: options.accept ?? 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  if (options.file) headers['Content-Type'] = options.file.type;
  return new Request(url(path, options.query), {
    method: options.method ?? 'GET',
    headers,
    body: options.file ? options.file.content : options.body === undefined ? undefined : JSON.stringify(options.body),
    credentials: 'same-origin',
  });
}

async function send(request: Request): Promise<Response> {
  if (accessToken) request.headers.set('Authorization', `Bearer ${accessToken}`);
  try {
    return await fetch(request);
  } catch {
    throw new ApiError(NETWORK_FAILURE, { message: 'network' });
  }
}

/** The bearer header for the one request fetch cannot make: an upload that reports its progress. */
export const authorizationHeader = (): Record<string, string> => (accessToken ? { Authorization: `Bearer ${accessToken}` } : {});

/** The server's error body, or the status text when the answer carries none (a proxy's page). */
function errorBodyOf(body: unknown, response: Response): Pick<ApiErrorBody, 'message' | 'errors'> {
  return body && typeof body === 'object' && 'message' in body ? (body as ApiErrorBody) : { message: response.statusText };
}

async function read<T>(response: Response): Promise<T> {
  const text = await response.text();
  const body: unknown = text ? safeJson(text) : undefined;
  if (response.ok) return body as T;
  throw new ApiError(response.status, errorBodyOf(body, response));
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
  refreshing ??= client.POST('/api/auth/refresh')
    // 204: no session cookie, nobody signed in; 401: the cookie was refused.
    .then((answer) => (answer.response.status === 204 || answer.response.status === 401 ? null : answerOf(answer)))
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
const CREDENTIAL_PATHS = new Set(['/api/auth/login', '/api/auth/refresh', '/api/auth/logout']);

/** Sends a request; a 401 on a signed-in call gets one retry after a refresh. */
async function sendSignedIn(request: Request): Promise<Response> {
  const signedIn = accessToken !== null;
  const retry = request.clone();
  const response = await send(request);
  if (response.status === 401 && signedIn && !CREDENTIAL_PATHS.has(new URL(request.url).pathname)) {
    const session = await refreshSession();
    if (session) return send(retry);
  }
  return response;
}

/**
 * The API's every path, parameter and body, typed from its OpenAPI document
 * (`@mantlepiece/shared/api`, generated by `npm run api:types`), sent the way `api` sends.
 */
// Read as JSON unless a call asks otherwise (`parseAs`), so an answer also offered as CSV is typed by its JSON.
export const client = createClient<paths, `${string}/json`>({
  baseUrl: origin,
  headers: { Accept: 'application/json' },
  credentials: 'same-origin',
  querySerializer: (query) => searchOf(query as Query),
  fetch: sendSignedIn,
});

/** A body the API answers with, by its name in the OpenAPI document. */
export type Schema<N extends keyof components['schemas']> = components['schemas'][N];

interface ClientAnswer {
  data?: unknown;
  error?: unknown;
  response: Response;
}

/** The body of a 2xx answer from `client`; any other answer throws ApiError, as `api` does. */
export async function answerOf<A extends ClientAnswer>(call: A | Promise<A>): Promise<Exclude<A['data'], undefined>> {
  const { data, error, response } = await call;
  if (!response.ok) throw new ApiError(response.status, errorBodyOf(error, response));
  return data as Exclude<A['data'], undefined>;
}

/** Calls the API and reads its JSON answer. */
export async function api<T>(path: string, options: RequestOptions = {}): Promise<T> {
  return read<T>(await sendSignedIn(requestOf(path, options)));
}

/** Calls the API for a file (`accept` names its type); a refusal still arrives as an ApiError. */
export async function apiFile(path: string, options: RequestOptions & { accept: string }): Promise<Blob> {
  const response = await sendSignedIn(requestOf(path, options));
  if (!response.ok) return read<never>(response);
  return response.blob();
}
