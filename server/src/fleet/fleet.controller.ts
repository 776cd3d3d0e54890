import { Controller, Get, Param, ParseIntPipe, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Roles } from '../auth/auth.decorators.js';
import { PageQuery } from '../common/page.js';
import { FleetService } from './fleet.service.js';

/** A kiosk's page on the Fleet: technicians' and admins' (the list and revoking are the kiosks module's). */
@ApiTags('kiosks')
@ApiBearerAuth()
@Roles('technician', 'admin')
@Controller('kiosks')
export class FleetController {
  constructor(private readonly fleet: FleetService) {}

  /** `?page&pageSize` page its heartbeat history. */
  @Get(':id')
  kiosk(@Param('id', ParseIntPipe) id: number, @Query() query: PageQuery) {
    return this.fleet.kiosk(id, query);
  }
}
