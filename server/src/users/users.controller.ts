import { Body, Controller, Get, Ip, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import { InviteUserDto } from './dto/invite-user.dto.js';
import { ListUsersQuery } from './dto/list-users.query.js';
import { UpdateUserDto } from './dto/update-user.dto.js';
import { InvitationsService } from './invitations.service.js';
import type { User } from './models/user.model.js';
import { UsersService } from './users.service.js';

@ApiTags('users')
@ApiBearerAuth()
@Roles('admin')
@Controller('users')
export class UsersController {
  constructor(
    private readonly users: UsersService,
    private readonly invitations: InvitationsService,
  ) {}

  @Get()
  list(@Query() query: ListUsersQuery) {
    return this.users.list(query);
  }

  @Post('invitations')
  invite(@CurrentUser() admin: User, @Body() dto: InviteUserDto, @Ip() ip: string) {
    return this.invitations.invite(admin, dto, ip);
  }

  @Patch(':id')
  update(@CurrentUser() admin: User, @Param('id', ParseIntPipe) id: number, @Body() dto: UpdateUserDto, @Ip() ip: string) {
    return this.users.updateUser(admin, id, dto, ip);
  }
}
