import { describe, expect, it } from 'vitest';
import { DEMO_GALLERY } from '../src/seed/demo-scenario.js';

/** The server `npm test` started, on the database `seed` filled. */
const server = process.env.MANTLEPIECE_URL;

async function call(path: string, init: RequestInit & { token?: string } = {}) {
  const headers = { 'Content-Type': 'application/json', ...(init.token ? { Authorization: `Bearer ${init.token}` } : {}) };
  return fetch(`${server}${path}`, { ...init, headers });
}

describe.runIf(server)('the demo gallery on the running server', () => {
  it('passes every release rule right after the first start, so a technician can build a release of it', async () => {
    const login = await call('/api/auth/login', { method: 'POST', body: JSON.stringify({ email: 'technician@demo.test', password: process.env.DEMO_PASSWORD ?? 'mantlepiece-demo' }) });
    const { accessToken: token } = (await login.json()) as { accessToken: string };
    const galleries = (await (await call(`/api/galleries?q=${encodeURIComponent(DEMO_GALLERY.name)}`, { token })).json()) as { items: { id: number }[] };
    const res = await call(`/api/galleries/${galleries.items[0]!.id}/releases`, { method: 'POST', body: '{}', token });
    expect({ status: res.status, body: await res.json() }).toEqual({ status: 202, body: { id: expect.any(Number), state: 'building' } });
  });
});
