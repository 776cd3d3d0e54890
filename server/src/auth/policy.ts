import type { Role, WorkflowActor } from '@mantlepiece/shared';

/** The signed-in person a policy decides for: their id and roles, as the guard read them on this request. */
export type Person = WorkflowActor;

/**
 * Whether the person holds any one of `roles`. The guard's `@Roles(...)` and every feature's
 * policy (which fills the `can` of its views) ask this same question of the same role lists.
 */
export const holdsAny = (person: Person, roles: readonly Role[]): boolean => roles.some((role) => person.roles.includes(role));

/** No one: the reader of views the server reads for itself (the demo seed), whose `can` is all false. */
export const NOBODY: Person = { id: 0, roles: [] };
