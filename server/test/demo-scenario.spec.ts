import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS, DEMO_VENUE } from '../src/seed/demo-scenario.js';

/** The server `npm test` started, on the database `seed` filled. */
const server = process.env.MANTLEPIECE_URL;

describe.runIf(server)('the seeded demo scenario on the running server', () => {
  it.each(DEMO_ACCOUNTS)('signs in $email with DEMO_PASSWORD as $roles', async (account) => {
    const res = await fetch(`${server}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: account.email, password: process.env.DEMO_PASSWORD ?? 'mantlepiece-demo' }),
    });
    expect(res.status).toBe(200);
    const { user } = (await res.json()) as { user: unknown };
    expect(user).toMatchObject({ email: account.email, name: account.name, roles: account.roles, locales: account.locales });
  });

  it('shows the demo venue to an unpaired kiosk', async () => {
    const res = await fetch(`${server}/api/kiosk/venue`);
    expect(await res.json()).toEqual({ name: DEMO_VENUE.name, locales: ['en', 'fr', 'es'] });
  });
});
