import { ForbiddenException } from '@nestjs/common';
import type { Transaction } from 'sequelize';
import type { Role } from '@mantlepiece/shared';
import { inScope, scopeWhere, venueScope, type Member } from '../auth/policy.js';
import { invalidField, unknownReference } from '../common/validation.js';
import type { Venue } from './models/venue.model.js';

/**
 * The venue a new story or image belongs to. A named venue must be one where the member holds one
 * of `roles`; any other answers as if it did not exist. Unnamed, it is the member's only such
 * venue; with several, the request must name one.
 */
export async function venueForNewWork(
  venues: typeof Venue,
  member: Member,
  roles: readonly Role[],
  requested: number | null | undefined,
  transaction?: Transaction,
): Promise<Venue> {
  const scope = venueScope(member, roles);
  if (requested != null) {
    const venue = inScope(scope, requested) ? await venues.findByPk(requested, { transaction }) : null;
    if (!venue) throw unknownReference(['venueId'], 'There is no such venue.');
    return venue;
  }
  const candidates = await venues.findAll({ where: scopeWhere(scope, 'id'), order: [['id', 'ASC']], limit: 2, transaction });
  if (candidates.length === 1) return candidates[0]!;
  if (candidates.length === 0) throw new ForbiddenException('Your role does not allow this at any venue.');
  throw invalidField(['venueId'], 'Choose the venue this belongs to.');
}
