import { Controller, Get, Param, ParseIntPipe, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import { FLEET_KEEPERS } from '../kiosks/kiosk-policy.js';
import type { User } from '../users/models/user.model.js';
import { PageQuery } from '../common/page.js';
import { FleetService } from './fleet.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

/** A kiosk's page on the Fleet: technicians' and admins' (the list and revoking are the kiosks module's). */
@ApiTags('kiosks')
@ApiBearerAuth()
@Roles(...FLEET_KEEPERS)
@Controller('kiosks')
export class FleetController {
  constructor(private readonly fleet: FleetService) {}

  /** `?page&pageSize` page its heartbeat history. */
  @ApiAnswer('FleetKioskDetail')
  @Get(':id')
  kiosk(@Param('id', ParseIntPipe) id: number, @Query() query: PageQuery, @CurrentUser() person: User) {
    return this.fleet.kiosk(id, query, person);
  }
}
