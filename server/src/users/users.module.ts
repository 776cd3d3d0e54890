import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { RefreshToken } from '../auth/models/refresh-token.model.js';
import { MailModule } from '../mail/mail.module.js';
import { Venue } from '../venues/models/venue.model.js';
import { VenueMembership } from './models/venue-membership.model.js';
import { Invitation } from './models/invitation.model.js';
import { User } from './models/user.model.js';
import { InvitationsService } from './invitations.service.js';
import { MembershipsService } from './memberships.service.js';
import { PasswordHasher } from './password-hasher.js';
import { UsersController } from './users.controller.js';
import { UsersService } from './users.service.js';

@Module({
  imports: [SequelizeModule.forFeature([User, VenueMembership, Invitation, RefreshToken, Venue]), MailModule],
  controllers: [UsersController],
  providers: [UsersService, InvitationsService, MembershipsService, PasswordHasher],
  exports: [UsersService, InvitationsService, PasswordHasher],
})
export class UsersModule {}
