import { ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type Order, type Transaction, type WhereOptions } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import type { Page, Role, UserView } from '@mantlepiece/shared';
import { AuditService } from '../audit/audit.service.js';
import { RefreshToken } from '../auth/models/refresh-token.model.js';
import type { Member } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { pageWindow, toPage } from '../common/page.js';
import type { ListUsersQuery } from './dto/list-users.query.js';
import type { UpdateUserDto } from './dto/update-user.dto.js';
import { User } from './models/user.model.js';
import { VenueMembership } from './models/venue-membership.model.js';
import { holdsWhole, peopleScope, reaches } from './people-scope.js';
import { toUserView } from './users.presenter.js';

export interface NewAccount {
  email: string;
  name: string;
  passwordHash: string;
  roles: Role[];
  locales: string[];
  uiLanguage: string;
}

const sameSet = (a: string[], b: string[]) => a.length === b.length && a.every((x) => b.includes(x));
const likePattern = (text: string) => `%${text.replace(/[\\%_]/g, '\\$&')}%`;

@Injectable()
export class UsersService {
  constructor(
    @InjectModel(User) private readonly users: typeof User,
    @InjectModel(RefreshToken) private readonly refreshTokens: typeof RefreshToken,
    private readonly sequelize: Sequelize,
    private readonly audit: AuditService,
    private readonly clock: Clock,
  ) {}

  findActive(id: number): Promise<User | null> {
    return this.users.findOne({ where: { id, active: true }, include: [VenueMembership] });
  }

  findByEmail(email: string, transaction?: Transaction): Promise<User | null> {
    return this.users.findOne({ where: { email: email.trim().toLowerCase() }, include: [VenueMembership], transaction });
  }

  count(): Promise<number> {
    return this.users.count();
  }

  /**
   * The active people holding `role` at one venue: by a role held at every venue or by their
   * membership there. Whoever the server tells about a venue's work (educators of a submission,
   * translators of a digest, technicians of a silent kiosk) is found here.
   */
  holdingAt(venueId: number, role: Role, transaction?: Transaction): Promise<User[]> {
    const roleJson = this.sequelize.escape(JSON.stringify(role));
    const memberThere = Sequelize.literal(
      `(SELECT user_id FROM venue_memberships WHERE venue_id = ${Number(venueId)} AND JSON_CONTAINS(roles, ${roleJson}))`,
    );
    return this.users.findAll({
      where: {
        active: true,
        [Op.or]: [Sequelize.where(Sequelize.fn('JSON_CONTAINS', Sequelize.col('User.roles'), JSON.stringify(role)), 1), { id: { [Op.in]: memberThere } }],
      },
      include: [VenueMembership],
      order: [['id', 'ASC']],
      transaction,
    });
  }

  /** Creates an account; refuses an address that already has one. */
  async createAccount(account: NewAccount, transaction?: Transaction): Promise<User> {
    if (await this.findByEmail(account.email, transaction)) {
      throw new ConflictException('This address already has an account.');
    }
    return this.users.create({ ...account, email: account.email.toLowerCase(), active: true }, { transaction });
  }

  /**
   * The People table: filtered, sorted and paged by the database. A venue admin sees the members
   * of their venues, and of each only the memberships at their venues.
   */
  async list(admin: Member, query: ListUsersQuery): Promise<Page<UserView>> {
    const scope = peopleScope(admin);
    const venueIds = scope.every ? null : scope.venueIds;
    // The venues whose people the reader asks for and may see.
    const wanted = query.venueId ? [query.venueId].filter((id) => !venueIds || venueIds.includes(id)) : venueIds;
    const conditions: WhereOptions<User>[] = [];
    if (venueIds) conditions.push({ id: { [Op.in]: this.membersOf(wanted) } });
    else if (wanted) {
      const everywhere = Sequelize.where(Sequelize.fn('JSON_LENGTH', Sequelize.col('User.roles')), { [Op.gt]: 0 });
      conditions.push({ [Op.or]: [everywhere, { id: { [Op.in]: this.membersOf(wanted) } }] });
    }
    if (query.q) {
      const pattern = likePattern(query.q.trim());
      conditions.push({ [Op.or]: [{ name: { [Op.like]: pattern } }, { email: { [Op.like]: pattern } }] });
    }
    if (query.role) {
      // The role held at every venue, or by a membership the reader asks for and may see.
      conditions.push({ [Op.or]: [this.holdsEverywhere(query.role), { id: { [Op.in]: this.membersOf(wanted, query.role) } }] });
    }
    if (query.active) conditions.push({ active: query.active === 'true' });

    const descending = query.sort.startsWith('-');
    const key = descending ? query.sort.slice(1) : query.sort;
    const order: Order = [[key, descending ? 'DESC' : 'ASC'], ['id', 'ASC']];
    const { rows, count } = await this.users.findAndCountAll({ where: { [Op.and]: conditions }, include: [VenueMembership], distinct: true, order, ...pageWindow(query) });
    return toPage(rows.map((user) => toUserView(user, scope)), count, query);
  }

  /** A subquery of the ids of people with a membership at one of `venueIds` (any venue when null), holding `role` there if named. */
  private membersOf(venueIds: readonly number[] | null, role?: Role) {
    const atVenues = venueIds ? `venue_id IN (${venueIds.length ? venueIds.map(Number).join(', ') : 'NULL'})` : 'TRUE';
    const holding = role ? `JSON_CONTAINS(roles, ${this.sequelize.escape(JSON.stringify(role))})` : 'TRUE';
    return Sequelize.literal(`(SELECT user_id FROM venue_memberships WHERE ${atVenues} AND ${holding})`);
  }

  private holdsEverywhere(role: Role) {
    return Sequelize.where(Sequelize.fn('JSON_CONTAINS', Sequelize.col('User.roles'), JSON.stringify(role)), 1);
  }

  /**
   * An admin changes a person's name, roles, locales or whether the account is active. Roles and
   * locales held at every venue are the organisation admin's to change; a venue admin changes the
   * name or deactivates only someone who works at their venues alone.
   */
  async updateUser(admin: Member, id: number, changes: UpdateUserDto, clientAddress: string): Promise<UserView> {
    if (admin.id === id && (changes.active === false || (changes.roles && admin.roles.includes('admin') && !changes.roles.includes('admin')))) {
      throw new ConflictException('You cannot remove your own admin access; ask another admin.');
    }
    const scope = peopleScope(admin);
    return this.sequelize.transaction(async (transaction) => {
      const user = await this.users.findByPk(id, { include: [VenueMembership], transaction, lock: transaction.LOCK.UPDATE });
      if (!user || !reaches(scope, user)) throw new NotFoundException('There is no such person.');
      const rolesChange = changes.roles && !sameSet(changes.roles, user.roles) ? changes.roles : undefined;
      const localesChange = changes.locales && !sameSet(changes.locales, user.locales) ? changes.locales : undefined;
      if (!scope.every && (rolesChange || localesChange)) {
        throw new ForbiddenException('Only an organisation admin changes roles and locales held at every venue; change the membership at your venue instead.');
      }
      const accountChange = (changes.name !== undefined && changes.name !== user.name) || (changes.active !== undefined && changes.active !== user.active);
      if (accountChange && !holdsWhole(scope, user)) {
        throw new ForbiddenException('This person also works at other venues; ask an organisation admin.');
      }
      const record = (action: Parameters<AuditService['record']>[0]['action'], detail: Record<string, unknown>) =>
        this.audit.record({ actorId: admin.id, action, targetType: 'user', targetId: user.id, detail, clientAddress }, transaction);

      if (rolesChange) {
        await record('user.roles-changed', { from: user.roles, to: rolesChange });
        user.roles = rolesChange;
      }
      if (localesChange) {
        await record('user.locales-changed', { from: user.locales, to: localesChange });
        user.locales = localesChange;
      }
      // A deactivated account fails the guard and refresh at once; its sessions end too, so activating it again does not revive them.
      if (changes.active !== undefined && changes.active !== user.active) {
        await record(changes.active ? 'user.activated' : 'user.deactivated', {});
        user.active = changes.active;
        if (!changes.active) {
          await this.refreshTokens.update({ revokedAt: this.clock.now() }, { where: { userId: user.id, revokedAt: null }, transaction });
        }
      }
      if (changes.name !== undefined) user.name = changes.name;
      await user.save({ transaction });
      return toUserView(user, scope);
    });
  }

  async updateOwnProfile(user: User, changes: { name?: string; uiLanguage?: string }): Promise<UserView> {
    if (changes.name !== undefined) user.name = changes.name;
    if (changes.uiLanguage !== undefined) user.uiLanguage = changes.uiLanguage;
    await user.save();
    return toUserView(user);
  }
}
