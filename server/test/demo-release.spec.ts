import { describe, expect, it } from 'vitest';
import { DEMO_GALLERY } from '../src/seed/demo-scenario.js';
import { demoPassword, runningServerUrl } from './running-server.js';

const server = runningServerUrl();

async function call(path: string, init: RequestInit & { token?: string } = {}) {
  const headers = { 'Content-Type': 'application/json', ...(init.token ? { Authorization: `Bearer ${init.token}` } : {}) };
  return fetch(`${server}${path}`, { ...init, headers });
}

describe('the demo gallery on the running server', () => {
  it('passes every release rule right after the first start, so a technician can build a release of it', async () => {
    const login = await call('/api/auth/login', { method: 'POST', body: JSON.stringify({ email: 'technician@demo.test', password: demoPassword }) });
    const { accessToken: token } = (await login.json()) as { accessToken: string };
    const galleries = (await (await call(`/api/galleries?q=${encodeURIComponent(DEMO_GALLERY.name)}`, { token })).json()) as { items: { id: number }[] };
    const res = await call(`/api/galleries/${galleries.items[0]!.id}/releases`, { method: 'POST', body: '{}', token });
    expect({ status: res.status, body: await res.json() }).toEqual({ status: 202, body: { id: expect.any(Number), state: 'building' } });
  });
});
