import type { Role } from '@mantlepiece/shared';
import type { apiAs } from './browser';

type Api = Awaited<ReturnType<typeof apiAs>>;

/** The account with exactly this address, as the People page finds it. */
async function personOf(asAdmin: Api, email: string): Promise<{ id: number } | undefined> {
  const { items } = await asAdmin<{ items: { id: number; email: string }[] }>('GET', `/users?q=${encodeURIComponent(email)}`);
  return items.find((user) => user.email === email);
}

/**
 * Makes a demo person a member of a venue a test set up, holding these roles (and translator
 * locales) there, as an admin does on the People page: demo staff belong to the demo venue only.
 */
export async function joinVenue(asAdmin: Api, email: string, venueId: number, roles: Role[], locales: string[] = []): Promise<void> {
  const person = await personOf(asAdmin, email);
  if (!person) throw new Error(`no account ${email}`);
  await asAdmin('PUT', `/users/${person.id}/memberships/${venueId}`, { roles, locales });
}

/** Ends that membership again, so the demo person belongs to the demo venue only for the suites after. */
export async function leaveVenue(asAdmin: Api, email: string, venueId: number): Promise<void> {
  const person = await personOf(asAdmin, email);
  if (person) await asAdmin('DELETE', `/users/${person.id}/memberships/${venueId}`);
}
