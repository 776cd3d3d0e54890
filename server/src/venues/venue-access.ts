import { ForbiddenException, NotFoundException } from '@nestjs/common';
import type { Role } from '@mantlepiece/shared';
import { holdsAny, inScope, rolesAt, venueScope, type Member } from '../auth/policy.js';

/**
 * Refuses what lies at a venue where the member holds none of `roles` (any role when none are
 * named) exactly as a thing that does not exist: `venueId` is undefined for a missing thing, and
 * `notFound` is the message both get, so the answer never tells them apart.
 */
export function refuseUnlessSeen(member: Member, venueId: number | undefined, notFound: string, roles?: readonly Role[]): asserts venueId is number {
  if (venueId === undefined || !inScope(venueScope(member, roles), venueId)) throw new NotFoundException(notFound);
}

/** Refuses (403) a member who may see a venue's thing but holds none of `roles` at that venue. */
export function refuseUnlessHoldingAt(member: Member, venueId: number, roles: readonly Role[], refusal: string): void {
  if (!holdsAny({ roles: rolesAt(member, venueId) }, roles)) throw new ForbiddenException(refusal);
}
