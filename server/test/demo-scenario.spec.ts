import { describe, expect, it } from 'vitest';
import type { GalleryView, InsightsView, Page, UserView, VenueView } from '@mantlepiece/shared';
import { DEMO_ACCOUNTS, DEMO_GALLERY, DEMO_VENUE, DEMO_VENUES } from '../src/seed/demo-scenario.js';
import { demoPassword, runningServerUrl } from './running-server.js';

const server = runningServerUrl();

async function signIn(email: string): Promise<{ user: UserView; accessToken: string }> {
  const res = await fetch(`${server}/api/auth/login`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password: demoPassword }) });
  return (await res.json()) as { user: UserView; accessToken: string };
}

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

  it.each(DEMO_ACCOUNTS)('makes $email a member of its venues only, with its roles and locales there', async (account) => {
    const admin = await signIn('admin@demo.test');
    const venues = (await (await fetch(`${server}/api/venues?pageSize=100`, { headers: { Authorization: `Bearer ${admin.accessToken}` } })).json()) as Page<VenueView>;
    const idOf = (key: keyof typeof DEMO_VENUES) => venues.items.find((venue) => venue.slug === DEMO_VENUES[key].slug)!.id;
    const { user } = await signIn(account.email);
    expect(user.memberships).toEqual(account.memberships.map(({ venue, ...grant }) => ({ venueId: idOf(venue), ...grant })).sort((a, b) => a.venueId - b.venueId));
  });

  it('shows the demo venue to an unpaired kiosk opened at its install URL', async () => {
    const res = await fetch(`${server}/api/kiosk/venue?slug=${DEMO_VENUE.slug}`);
    expect(await res.json()).toEqual({ name: DEMO_VENUE.name, locales: ['en', 'fr', 'es'] });
  });

  it("invents visitors' touches of every setting a visitor moves, on the slab story's sea floor and plate forces too", async () => {
    const technician = await signIn('technician@demo.test');
    const get = async <T>(path: string) => (await (await fetch(`${server}/api${path}`, { headers: { Authorization: `Bearer ${technician.accessToken}` } })).json()) as T;
    const gallery = (await get<Page<GalleryView>>('/galleries?pageSize=100')).items.find((candidate) => candidate.name === DEMO_GALLERY.name)!;
    const insights = await get<InsightsView>(`/insights?galleryId=${gallery.id}`);
    const touched = Object.fromEntries(insights.widgets.map((use) => [use.widgetType, use.params.filter((p) => p.touches > 0).map((p) => p.param).sort()]));
    // Other suites' kiosks may add touches of their own to the gallery, so each list need only hold these.
    expect(touched).toMatchObject({
      'slope-force': expect.arrayContaining(['angleDeg']),
      'sea-floor-depth': expect.arrayContaining(['ageMyr', 'model']),
      'plate-forces': expect.arrayContaining(['ageMyr', 'slabLengthKm']),
    });
  });
});
