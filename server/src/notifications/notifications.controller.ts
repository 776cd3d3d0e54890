import { Body, Controller, Get, HttpCode, HttpStatus, Post, Put, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { ListNotificationsQuery, MarkReadDto, NotificationPreferencesDto } from './dto/notifications.dto.js';
import { NotificationsService } from './notifications.service.js';
import { ApiAnswer, ApiNoBody } from '../openapi/api-answer.decorator.js';

/** Each signed-in person's own notifications and mail settings. */
@ApiTags('notifications')
@ApiBearerAuth()
@Controller('notifications')
export class NotificationsController {
  constructor(private readonly notifications: NotificationsService) {}

  @ApiAnswer('NotificationPage')
  @Get()
  list(@CurrentUser() person: User, @Query() query: ListNotificationsQuery) {
    return this.notifications.list(person, query);
  }

  @ApiNoBody()
  @Post('read')
  @HttpCode(HttpStatus.NO_CONTENT)
  markRead(@CurrentUser() person: User, @Body() dto: MarkReadDto) {
    return this.notifications.markRead(person, dto);
  }

  @ApiAnswer('NotificationPreferences')
  @Get('preferences')
  preferences(@CurrentUser() person: User) {
    return this.notifications.preferencesOf(person);
  }

  @ApiAnswer('NotificationPreferences')
  @Put('preferences')
  setPreferences(@CurrentUser() person: User, @Body() dto: NotificationPreferencesDto) {
    return this.notifications.setPreferences(person, dto);
  }
}
