import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type Order, type Transaction, type WhereOptions } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import type { Page, Role, UserView } from '@mantlepiece/shared';
import { AuditService } from '../audit/audit.service.js';
import { RefreshToken } from '../auth/models/refresh-token.model.js';
import { Clock } from '../clock/clock.service.js';
import { pageWindow, toPage } from '../common/page.js';
import type { ListUsersQuery } from './dto/list-users.query.js';
import type { UpdateUserDto } from './dto/update-user.dto.js';
import { User } from './models/user.model.js';
import { VenueMembership } from './models/venue-membership.model.js';
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

  /** The People table: filtered, sorted and paged by the database. */
  async list(query: ListUsersQuery): Promise<Page<UserView>> {
    const conditions: WhereOptions<User>[] = [];
    if (query.q) {
      const pattern = likePattern(query.q.trim());
      conditions.push({ [Op.or]: [{ name: { [Op.like]: pattern } }, { email: { [Op.like]: pattern } }] });
    }
    if (query.role) {
      conditions.push(Sequelize.where(Sequelize.fn('JSON_CONTAINS', Sequelize.col('roles'), JSON.stringify(query.role)), 1));
    }
    if (query.active) conditions.push({ active: query.active === 'true' });

    const descending = query.sort.startsWith('-');
    const key = descending ? query.sort.slice(1) : query.sort;
    const order: Order = [[key, descending ? 'DESC' : 'ASC'], ['id', 'ASC']];
    const { rows, count } = await this.users.findAndCountAll({ where: { [Op.and]: conditions }, include: [VenueMembership], distinct: true, order, ...pageWindow(query) });
    return toPage(rows.map(toUserView), count, query);
  }

  /** An admin changes a person's name, roles, locales or whether the account is active. */
  async updateUser(actor: User, id: number, changes: UpdateUserDto, clientAddress: string): Promise<UserView> {
    if (actor.id === id && (changes.active === false || (changes.roles && !changes.roles.includes('admin')))) {
      throw new ConflictException('You cannot remove your own admin access; ask another admin.');
    }
    return this.sequelize.transaction(async (transaction) => {
      const user = await this.users.findByPk(id, { include: [VenueMembership], transaction, lock: transaction.LOCK.UPDATE });
      if (!user) throw new NotFoundException('There is no such person.');
      const record = (action: Parameters<AuditService['record']>[0]['action'], detail: Record<string, unknown>) =>
        this.audit.record({ actorId: actor.id, action, targetType: 'user', targetId: user.id, detail, clientAddress }, transaction);

      if (changes.roles && !sameSet(changes.roles, user.roles)) {
        await record('user.roles-changed', { from: user.roles, to: changes.roles });
        user.roles = changes.roles;
      }
      if (changes.locales && !sameSet(changes.locales, user.locales)) {
        await record('user.locales-changed', { from: user.locales, to: changes.locales });
        user.locales = changes.locales;
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
      return toUserView(user);
    });
  }

  async updateOwnProfile(user: User, changes: { name?: string; uiLanguage?: string }): Promise<UserView> {
    if (changes.name !== undefined) user.name = changes.name;
    if (changes.uiLanguage !== undefined) user.uiLanguage = changes.uiLanguage;
    await user.save();
    return toUserView(user);
  }
}
