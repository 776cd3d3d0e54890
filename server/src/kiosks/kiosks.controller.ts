import { Body, Controller, Get, HttpCode, HttpStatus, Ip, Param, ParseIntPipe, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { KioskStates } from '../fleet/kiosk-states.service.js';
import { ListKiosksQuery } from './dto/kiosk-report.dto.js';
import { PairStationDto } from './dto/pairing.dto.js';
import { FLEET_KEEPERS } from './kiosk-policy.js';
import { KiosksService } from './kiosks.service.js';
import { PairingService } from './pairing.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

/** The fleet as technicians handle it: pairing at a station, the kiosk list, revoking. */
@ApiTags('kiosks')
@ApiBearerAuth()
@Roles(...FLEET_KEEPERS)
@Controller()
export class KiosksController {
  constructor(
    private readonly pairing: PairingService,
    private readonly kiosks: KiosksService,
    private readonly states: KioskStates,
  ) {}

  @ApiAnswer('PairedStationView', { status: HttpStatus.CREATED })
  @Post('stations/:id/pair')
  pair(@Param('id', ParseIntPipe) stationId: number, @Body() dto: PairStationDto, @CurrentUser() user: User, @Ip() address: string) {
    return this.pairing.pairStation(stationId, dto.pairingCode, user, address);
  }

  @ApiAnswer('FleetPage')
  @Get('kiosks')
  async list(@Query() query: ListKiosksQuery, @CurrentUser() person: User) {
    const page = await this.kiosks.list(query, person);
    return { ...page, items: page.items.map((kiosk) => this.states.present(kiosk)), thresholds: this.states.thresholds };
  }

  /** The kiosk as the Fleet lists it, so the page can show its row revoked without asking again. */
  @ApiAnswer('FleetKioskView')
  @Post('kiosks/:id/revoke')
  @HttpCode(HttpStatus.OK)
  async revoke(@Param('id', ParseIntPipe) id: number, @CurrentUser() user: User) {
    return this.states.present(await this.kiosks.revoke(id, user));
  }
}
