import { Body, Controller, Delete, Get, Ip, Param, ParseIntPipe, Patch, Post, Put, Query, HttpStatus } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import { InviteUserDto } from './dto/invite-user.dto.js';
import { ListUsersQuery } from './dto/list-users.query.js';
import { MembershipDto } from './dto/membership.dto.js';
import { UpdateUserDto } from './dto/update-user.dto.js';
import { InvitationsService } from './invitations.service.js';
import { MembershipsService } from './memberships.service.js';
import type { User } from './models/user.model.js';
import { UsersService } from './users.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

/**
 * People, for the organisation admin (every person, every venue) and for a venue admin (the
 * members of their venues, and those venues' memberships only).
 */
@ApiTags('users')
@ApiBearerAuth()
@Roles('admin')
@Controller('users')
export class UsersController {
  constructor(
    private readonly users: UsersService,
    private readonly invitations: InvitationsService,
    private readonly memberships: MembershipsService,
  ) {}

  @ApiAnswer('UserPage')
  @Get()
  list(@CurrentUser() admin: User, @Query() query: ListUsersQuery) {
    return this.users.list(admin, query);
  }

  @ApiOperation({ summary: 'Invite someone: to one venue (venueId) with roles there, or, by the organisation admin only, with roles at every venue' })
  @ApiAnswer('InvitationView', { status: HttpStatus.CREATED })
  @Post('invitations')
  invite(@CurrentUser() admin: User, @Body() dto: InviteUserDto, @Ip() ip: string) {
    return this.invitations.invite(admin, dto, ip);
  }

  @ApiOperation({ summary: 'Change a name or whether the account is active; roles and locales held at every venue only by the organisation admin' })
  @ApiAnswer('UserView')
  @Patch(':id')
  update(@CurrentUser() admin: User, @Param('id', ParseIntPipe) id: number, @Body() dto: UpdateUserDto, @Ip() ip: string) {
    return this.users.updateUser(admin, id, dto, ip);
  }

  @ApiOperation({ summary: "Set the person's roles and locales at one venue (creating the membership or replacing it)" })
  @ApiAnswer('UserView')
  @Put(':id/memberships/:venueId')
  setMembership(
    @CurrentUser() admin: User,
    @Param('id', ParseIntPipe) id: number,
    @Param('venueId', ParseIntPipe) venueId: number,
    @Body() dto: MembershipDto,
    @Ip() ip: string,
  ) {
    return this.memberships.set(admin, id, venueId, dto, ip);
  }

  @ApiOperation({ summary: "End the person's membership at one venue" })
  @ApiAnswer('UserView')
  @Delete(':id/memberships/:venueId')
  removeMembership(@CurrentUser() admin: User, @Param('id', ParseIntPipe) id: number, @Param('venueId', ParseIntPipe) venueId: number, @Ip() ip: string) {
    return this.memberships.remove(admin, id, venueId, ip);
  }
}
