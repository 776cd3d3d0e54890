import { ROLES, type Role, type WorkflowActor } from '@mantlepiece/shared';

/** A person as one decision sees them: their id and the roles they hold where the decision is made. */
export type Person = WorkflowActor;

/** The roles and locales a person holds at one venue. */
export interface VenueGrant {
  venueId: number;
  roles: readonly Role[];
  locales: readonly string[];
}

/**
 * The signed-in person as the guard read them: roles and locales that hold at every venue (the
 * organisation admin's, or anyone not narrowed to venues) and a grant per venue they belong to.
 */
export interface Member extends Person {
  locales: readonly string[];
  memberships?: readonly VenueGrant[];
}

const union = <T>(...lists: readonly (readonly T[])[]): T[] => [...new Set(lists.flat())];

/**
 * Whether the person holds any one of `roles`. The guard's `@Roles(...)` and every feature's
 * policy (which fills the `can` of its views) ask this same question of the same role lists.
 */
export const holdsAny = (person: { roles: readonly Role[] }, roles: readonly Role[]): boolean => roles.some((role) => person.roles.includes(role));

const grantAt = (member: Member, venueId: number) => member.memberships?.find((grant) => grant.venueId === venueId);

/** The member's roles at one venue: those held everywhere and those of that venue's membership. */
export const rolesAt = (member: Member, venueId: number): Role[] => union(member.roles, grantAt(member, venueId)?.roles ?? []);

/** The locales a translator translates into at one venue. */
export const localesAt = (member: Member, venueId: number): string[] => union(member.locales, grantAt(member, venueId)?.locales ?? []);

/** The member as a decision about something of one venue sees them. */
export const personAt = (member: Member, venueId: number): Person => ({ id: member.id, roles: rolesAt(member, venueId) });

/** Every role the member holds at any venue: what the guard's coarse `@Roles(...)` check asks of. */
export const rolesAnywhere = (member: Member): Role[] =>
  ROLES.filter((role) => member.roles.includes(role) || member.memberships?.some((grant) => grant.roles.includes(role)));

/** Where a member may look: at every venue, or at these venues only. */
export type VenueScope = { every: true } | { every: false; venueIds: number[] };

/**
 * The venues where the member holds any of `roles` (any role at all when none are named). Roles
 * held everywhere reach every venue, including ones created later.
 */
export function venueScope(member: Member, roles: readonly Role[] = ROLES): VenueScope {
  if (holdsAny(member, roles)) return { every: true };
  const venueIds = (member.memberships ?? []).filter((grant) => holdsAny(grant, roles)).map((grant) => grant.venueId);
  return { every: false, venueIds };
}

export const inScope = (scope: VenueScope, venueId: number): boolean => scope.every || scope.venueIds.includes(venueId);

/** A `where` condition keeping rows of the scope's venues (`column` names the row's venue attribute). */
export const scopeWhere = (scope: VenueScope, column = 'venueId'): Record<string, number[]> =>
  scope.every ? {} : { [column]: scope.venueIds };

/** No one: the reader of views the server reads for itself (the demo seed), whose `can` is all false. */
export const NOBODY: Person = { id: 0, roles: [] };
