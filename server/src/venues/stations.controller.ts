import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { Roles } from '../auth/auth.decorators.js';
import { CreateStationDto, ListStationsQuery, UpdateStationDto } from './dto/station.dto.js';
import { StationsService } from './stations.service.js';

@ApiTags('stations')
@ApiBearerAuth()
@Roles('admin')
@Controller('stations')
export class StationsController {
  constructor(private readonly stations: StationsService) {}

  @Roles(...ROLES)
  @Get()
  list(@Query() query: ListStationsQuery) {
    return this.stations.list(query);
  }

  @Roles(...ROLES)
  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number) {
    return this.stations.get(id);
  }

  @Post()
  create(@Body() dto: CreateStationDto) {
    return this.stations.create(dto);
  }

  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateStationDto) {
    return this.stations.update(id, dto);
  }

  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number) {
    return this.stations.delete(id);
  }
}
