import { ForbiddenException, NotFoundException } from '@nestjs/common';
import type { Role } from '@mantlepiece/shared';
import { holdsAny, inScope, personAt, venueScope, type Member, type Person } from '../auth/policy.js';

/**
 * A row of one venue as the member may reach it. Another venue's row answers exactly as a missing
 * one does (404, same message), so its existence is not revealed.
 */
export function withinReach<T extends { venueId: number }>(member: Member, row: T | null | undefined, missing: string): T {
  if (!row || !inScope(venueScope(member), row.venueId)) throw new NotFoundException(missing);
  return row;
}

/**
 * The member as a decision at `venueId` sees them, refused as the guard refuses (403) unless they
 * hold one of `roles` there: a curator at one venue and educator at another writes at the first only.
 */
export function actingAt(member: Member, venueId: number, roles: readonly Role[]): Person {
  const person = personAt(member, venueId);
  if (!holdsAny(person, roles)) throw new ForbiddenException('Your role does not allow this.');
  return person;
}
