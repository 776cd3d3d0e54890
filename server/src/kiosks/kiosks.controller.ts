import { Body, Controller, Get, HttpCode, HttpStatus, Ip, Param, ParseIntPipe, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { ListKiosksQuery } from './dto/kiosk-report.dto.js';
import { PairStationDto } from './dto/pairing.dto.js';
import { KiosksService } from './kiosks.service.js';
import { PairingService } from './pairing.service.js';

const TECHNICIANS = ['technician', 'admin'] as const;

/** The fleet as technicians handle it: pairing at a station, the kiosk list, revoking. */
@ApiTags('kiosks')
@ApiBearerAuth()
@Roles(...TECHNICIANS)
@Controller()
export class KiosksController {
  constructor(
    private readonly pairing: PairingService,
    private readonly kiosks: KiosksService,
  ) {}

  @Post('stations/:id/pair')
  pair(@Param('id', ParseIntPipe) stationId: number, @Body() dto: PairStationDto, @CurrentUser() user: User, @Ip() address: string) {
    return this.pairing.pairStation(stationId, dto.pairingCode, user, address);
  }

  @Get('kiosks')
  list(@Query() query: ListKiosksQuery) {
    return this.kiosks.list(query);
  }

  @Post('kiosks/:id/revoke')
  @HttpCode(HttpStatus.OK)
  revoke(@Param('id', ParseIntPipe) id: number, @CurrentUser() user: User) {
    return this.kiosks.revoke(id, user);
  }
}
