import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { ApiCan } from '../auth/api-can.js';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { CreateStationDto, ListStationsQuery, UpdateStationDto } from './dto/station.dto.js';
import { SETTINGS_KEEPERS } from './station-policy.js';
import { StationsService } from './stations.service.js';

@ApiTags('stations')
@ApiBearerAuth()
@Roles(...SETTINGS_KEEPERS)
@Controller('stations')
export class StationsController {
  constructor(private readonly stations: StationsService) {}

  @ApiCan('station', { page: true })
  @Roles(...ROLES)
  @Get()
  list(@Query() query: ListStationsQuery, @CurrentUser() person: User) {
    return this.stations.list(query, person);
  }

  @ApiCan('station')
  @Roles(...ROLES)
  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.stations.get(id, person);
  }

  @ApiCan('station', { one: true, created: true })
  @Post()
  create(@Body() dto: CreateStationDto, @CurrentUser() person: User) {
    return this.stations.create(dto, person);
  }

  @ApiCan('station')
  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateStationDto, @CurrentUser() person: User) {
    return this.stations.update(id, dto, person);
  }

  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.stations.delete(id, person);
  }
}
