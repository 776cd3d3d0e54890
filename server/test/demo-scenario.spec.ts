import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS, DEMO_VENUE } from '../src/seed/demo-scenario.js';
import { demoPassword, runningServerUrl } from './running-server.js';

const server = runningServerUrl();

describe('the seeded demo scenario on the running server', () => {
  it.each(DEMO_ACCOUNTS)('signs in $email with DEMO_PASSWORD as $roles', async (account) => {
    const res = await fetch(`${server}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: account.email, password: demoPassword }),
    });
    expect(res.status).toBe(200);
    const { user } = (await res.json()) as { user: unknown };
    expect(user).toMatchObject({ email: account.email, name: account.name, roles: account.roles, locales: account.locales });
  });

  it('shows the demo venue to an unpaired kiosk opened at its install URL', async () => {
    const res = await fetch(`${server}/api/kiosk/venue?slug=${DEMO_VENUE.slug}`);
    expect(await res.json()).toEqual({ name: DEMO_VENUE.name, locales: ['en', 'fr', 'es'] });
  });
});
