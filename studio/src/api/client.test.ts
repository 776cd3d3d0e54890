import { afterEach, describe, expect, it, vi } from 'vitest';
import { answerOf, client, refreshSession } from './client';

/** Records each request the client sends and answers it with `answer`. */
function serve(answer: () => Response): Request[] {
  const sent: Request[] = [];
  vi.stubGlobal('fetch', vi.fn(async (request: Request) => {
    sent.push(request);
    return answer();
  }));
  return sent;
}

const json = (body: unknown, status = 200) => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('the typed client', () => {
  it('sends a list in the query as one comma-separated parameter and leaves out an empty one', async () => {
    const sent = serve(() => json({}));
    await answerOf(client.GET('/api/galleries/{id}/releases/preview', { params: { path: { id: 3 }, query: { leaveOut: [], showInSource: [4, 5] } } }));
    // WHATWG URL standard, application/x-www-form-urlencoded serializer: ',' is written %2C.
    const url = new URL(sent[0]!.url);
    expect(url.pathname).toBe('/api/galleries/3/releases/preview');
    expect(url.search).toBe('?showInSource=4%2C5');
  });

  it('shares one refresh among concurrent callers, since the server rotates the cookie on each', async () => {
    const session = { accessToken: 'token', user: { id: 1 } };
    const sent = serve(() => json(session));
    const [first, second] = await Promise.all([refreshSession(), refreshSession()]);
    expect(sent).toHaveLength(1);
    expect(sent[0]!.method).toBe('POST');
    expect(new URL(sent[0]!.url).pathname).toBe('/api/auth/refresh');
    expect(first).toEqual(session);
    expect(second).toBe(first);
  });

  it('answers no session when the server has none to refresh (204) or refuses the cookie (401)', async () => {
    serve(() => new Response(null, { status: 204 }));
    expect(await refreshSession()).toBeNull();
    serve(() => json({ statusCode: 401, message: 'Unauthorized' }, 401));
    expect(await refreshSession()).toBeNull();
  });
});
