import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { CreateStationDto, ListStationsQuery, UpdateStationDto } from './dto/station.dto.js';
import { SETTINGS_KEEPERS } from './station-policy.js';
import { StationsService } from './stations.service.js';
import { ApiAnswer, ApiNoBody } from '../openapi/api-answer.decorator.js';

@ApiTags('stations')
@ApiBearerAuth()
@Roles(...SETTINGS_KEEPERS)
@Controller('stations')
export class StationsController {
  constructor(private readonly stations: StationsService) {}

  @Roles(...ROLES)
  @ApiAnswer('StationPage')
  @Get()
  list(@Query() query: ListStationsQuery, @CurrentUser() person: User) {
    return this.stations.list(query, person);
  }

  @Roles(...ROLES)
  @ApiAnswer('StationView')
  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.stations.get(id, person);
  }

  @ApiAnswer('StationView', { status: HttpStatus.CREATED })
  @Post()
  create(@Body() dto: CreateStationDto, @CurrentUser() person: User) {
    return this.stations.create(dto, person);
  }

  @ApiAnswer('StationView')
  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateStationDto, @CurrentUser() person: User) {
    return this.stations.update(id, dto, person);
  }

  @ApiNoBody()
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.stations.delete(id, person);
  }
}
