import { getModelToken } from '@nestjs/sequelize';
import type { Role } from '@mantlepiece/shared';
import { VenueMembership } from '../src/users/models/venue-membership.model.js';
import type { User } from '../src/users/models/user.model.js';
import { bearer, createPerson, signIn, type TestApp } from './test-app.js';

export interface VenueMember {
  headers: Record<string, string>;
  user: User;
}

/**
 * A new person whose only grant is a membership at `venueId` (no role held at every venue),
 * signed in. Call again with the same `user` to give them a second venue.
 */
export async function memberAt(t: TestApp, venueId: number, roles: Role[], locales: string[] = [], user?: User): Promise<VenueMember> {
  const person = user ?? (await createPerson(t, { roles: [], name: `Member of venue ${venueId}` }));
  await t.app.get<typeof VenueMembership>(getModelToken(VenueMembership)).create({ userId: person.id, venueId, roles, locales });
  return { headers: bearer((await signIn(t, person.email)).accessToken), user: person };
}
