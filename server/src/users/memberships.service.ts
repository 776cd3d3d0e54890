import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import type { Role, UserView } from '@mantlepiece/shared';
import { AuditService } from '../audit/audit.service.js';
import { inScope, rolesAt, type VenueGrant } from '../auth/policy.js';
import { Venue } from '../venues/models/venue.model.js';
import type { MembershipDto } from './dto/membership.dto.js';
import { User } from './models/user.model.js';
import { VenueMembership } from './models/venue-membership.model.js';
import { peopleScope, reaches } from './people-scope.js';
import { toUserView } from './users.presenter.js';

const sameSet = (a: readonly string[], b: readonly string[]) => a.length === b.length && a.every((x) => b.includes(x));

/**
 * A person's roles and locales at one venue, granted, changed or ended by the organisation admin
 * or by an admin of that venue. A venue admin reaches only the members of their venues, and only
 * their venues' memberships: anyone else answers as if they did not exist.
 */
@Injectable()
export class MembershipsService {
  constructor(
    @InjectModel(User) private readonly users: typeof User,
    @InjectModel(VenueMembership) private readonly memberships: typeof VenueMembership,
    @InjectModel(Venue) private readonly venues: typeof Venue,
    private readonly sequelize: Sequelize,
    private readonly audit: AuditService,
  ) {}

  /** Grants the roles and locales at the venue, replacing what the person held there. */
  set(admin: User, userId: number, venueId: number, grant: MembershipDto, clientAddress: string): Promise<UserView> {
    return this.change(admin, userId, venueId, grant, clientAddress);
  }

  /** Ends the person's membership at the venue; their account and other venues stay. */
  remove(admin: User, userId: number, venueId: number, clientAddress: string): Promise<UserView> {
    return this.change(admin, userId, venueId, null, clientAddress);
  }

  private change(admin: User, userId: number, venueId: number, next: MembershipDto | null, clientAddress: string): Promise<UserView> {
    const scope = peopleScope(admin);
    return this.sequelize.transaction(async (transaction) => {
      // The person's row is the lock: two changes to one person's memberships run one after the other.
      const user = await this.users.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
      const held = user ? await this.memberships.findAll({ where: { userId }, transaction, lock: transaction.LOCK.UPDATE }) : [];
      if (!user || !reaches(scope, { roles: user.roles, memberships: held })) throw new NotFoundException('There is no such person.');
      if (!inScope(scope, venueId) || !(await this.venues.findByPk(venueId, { transaction }))) throw new NotFoundException('There is no such venue.');

      const before = held.find((grant) => grant.venueId === venueId);
      if (admin.id === userId && losesAdmin(admin, venueId, next)) {
        throw new ConflictException('You cannot remove your own admin access; ask another admin.');
      }
      const from = { roles: before?.roles ?? [], locales: before?.locales ?? [] };
      const to = { roles: next?.roles ?? [], locales: next?.locales ?? [] };
      const record = (action: 'user.roles-changed' | 'user.locales-changed', detail: Record<string, unknown>) =>
        this.audit.record({ actorId: admin.id, action, targetType: 'user', targetId: userId, venueId, detail, clientAddress }, transaction);
      if (!sameSet(from.roles, to.roles)) await record('user.roles-changed', { from: from.roles, to: to.roles });
      if (!sameSet(from.locales, to.locales)) await record('user.locales-changed', { from: from.locales, to: to.locales });

      if (next && before) await before.update({ roles: next.roles, locales: next.locales }, { transaction });
      else if (next) held.push(await this.memberships.create({ userId, venueId, roles: next.roles, locales: next.locales }, { transaction }));
      else if (before) await before.destroy({ transaction });
      user.memberships = held.filter((grant) => next || grant !== before);
      return toUserView(user, scope);
    });
  }
}

/** Whether the change takes away the admin role the admin now holds at the venue (the organisation admin's stays). */
function losesAdmin(admin: User, venueId: number, next: { roles: readonly Role[] } | null): boolean {
  const others: VenueGrant[] = (admin.memberships ?? []).filter((grant) => grant.venueId !== venueId);
  const after = { id: admin.id, roles: admin.roles, locales: admin.locales, memberships: next ? [...others, { venueId, roles: next.roles, locales: [] }] : others };
  return rolesAt(admin, venueId).includes('admin') && !rolesAt(after, venueId).includes('admin');
}
