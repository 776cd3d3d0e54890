import { ConflictException, GoneException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service.js';
import { Clock } from '../clock/clock.service.js';
import { hashToken, newToken } from '../common/tokens.js';
import { ConfigService } from '../config/config.service.js';
import { MailService } from '../mail/mail.service.js';
import { Venue } from '../venues/models/venue.model.js';
import { venueForNewWork } from '../venues/venue-for-new-work.js';
import type { InviteUserDto } from './dto/invite-user.dto.js';
import { Invitation } from './models/invitation.model.js';
import type { User } from './models/user.model.js';
import { VenueMembership } from './models/venue-membership.model.js';
import { peopleScope } from './people-scope.js';
import { PasswordHasher } from './password-hasher.js';
import { toInvitationPreview, toInvitationView } from './users.presenter.js';
import { UsersService } from './users.service.js';

/** Invitations by e-mail: the link works once, until it expires; only its hash is stored. */
@Injectable()
export class InvitationsService {
  constructor(
    @InjectModel(Invitation) private readonly invitations: typeof Invitation,
    @InjectModel(VenueMembership) private readonly memberships: typeof VenueMembership,
    @InjectModel(Venue) private readonly venues: typeof Venue,
    private readonly sequelize: Sequelize,
    private readonly users: UsersService,
    private readonly hasher: PasswordHasher,
    private readonly mail: MailService,
    private readonly audit: AuditService,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {}

  async invite(admin: User, dto: InviteUserDto, clientAddress: string) {
    const venueId = await this.invitedVenue(admin, dto.venueId);
    if (await this.users.findByEmail(dto.email)) throw new ConflictException('This address already has an account.');
    const token = newToken();
    const uiLanguage = dto.uiLanguage ?? admin.uiLanguage;
    return this.sequelize.transaction(async (transaction) => {
      const invitation = await this.invitations.create(
        {
          email: dto.email,
          name: dto.name,
          venueId,
          roles: dto.roles,
          locales: dto.locales,
          uiLanguage,
          tokenHash: hashToken(token),
          invitedById: admin.id,
          expiresAt: this.clock.fromNow(this.config.invitationTtlHours * 3_600_000),
        },
        { transaction },
      );
      await this.mail.enqueue(dto.email, uiLanguage, {
        kind: 'invitation',
        name: dto.name,
        inviterName: admin.name,
        link: this.mail.studioLink(`/invitation/${token}`),
        expiresAt: invitation.expiresAt,
      }, transaction);
      await this.audit.record({
        actorId: admin.id, action: 'user.invited', targetType: 'invitation', targetId: invitation.id, venueId: venueId ?? undefined,
        detail: { email: dto.email, roles: dto.roles, locales: dto.locales }, clientAddress,
      }, transaction);
      return toInvitationView(invitation);
    });
  }

  async describe(token: string) {
    return toInvitationPreview(await this.findUsable(token));
  }

  /**
   * The venue an invitation grants roles at: none (every venue) only when the organisation admin
   * names none; a venue admin invites to one of their venues, or their only one.
   */
  private async invitedVenue(admin: User, requested: number | null | undefined): Promise<number | null> {
    if (requested == null && peopleScope(admin).every) return null;
    return (await venueForNewWork(this.venues, admin, ['admin'], requested)).id;
  }

  /** Turns the invitation into an account with the roles and locales the admin chose, at its venue or at every venue. */
  async accept(token: string, name: string, password: string, clientAddress: string): Promise<User> {
    const passwordHash = await this.hasher.hash(password);
    return this.sequelize.transaction(async (transaction) => {
      const invitation = await this.findUsable(token, transaction);
      const grant = { roles: invitation.roles, locales: invitation.locales };
      const atVenue = invitation.venueId !== null;
      const user = await this.users.createAccount({
        email: invitation.email, name, passwordHash, uiLanguage: invitation.uiLanguage,
        ...(atVenue ? { roles: [], locales: [] } : grant),
      }, transaction);
      if (atVenue) {
        user.memberships = [await this.memberships.create({ userId: user.id, venueId: invitation.venueId, ...grant }, { transaction })];
      }
      invitation.acceptedAt = this.clock.now();
      await invitation.save({ transaction });
      await this.audit.record({
        actorId: user.id, action: 'user.invitation-accepted', targetType: 'user', targetId: user.id, venueId: invitation.venueId ?? undefined,
        detail: { invitationId: invitation.id }, clientAddress,
      }, transaction);
      return user;
    });
  }

  private async findUsable(token: string, transaction?: Transaction): Promise<Invitation> {
    const invitation = await this.invitations.findOne({
      where: { tokenHash: hashToken(token) },
      transaction,
      lock: transaction ? transaction.LOCK.UPDATE : undefined,
    });
    if (!invitation) throw new NotFoundException('This invitation link is not valid.');
    if (invitation.acceptedAt || invitation.expiresAt <= this.clock.now()) {
      throw new GoneException('This invitation link has expired or was already used. Ask an admin for a new one.');
    }
    return invitation;
  }
}
