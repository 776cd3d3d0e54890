import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { CurrentUser, ForOrganisation, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { CreateVenueDto, UpdateVenueDto } from './dto/venue.dto.js';
import { ListSettingsQuery } from './settings.service.js';
import { VenuesService } from './venues.service.js';
import { ApiAnswer, ApiNoBody } from '../openapi/api-answer.decorator.js';

@ApiTags('venues')
@Controller()
export class VenuesController {
  constructor(private readonly venues: VenuesService) {}

  @ApiBearerAuth()
  @Roles(...ROLES)
  @ApiAnswer('VenuePage')
  @Get('venues')
  list(@Query() query: ListSettingsQuery, @CurrentUser() person: User) {
    return this.venues.list(query, person);
  }

  @ApiBearerAuth()
  @Roles(...ROLES)
  @ApiAnswer('VenueView')
  @Get('venues/:id')
  get(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.venues.get(id, person);
  }

  @ApiBearerAuth()
  @Roles('admin')
  @ForOrganisation()
  @ApiAnswer('VenueView', { status: HttpStatus.CREATED })
  @Post('venues')
  create(@Body() dto: CreateVenueDto, @CurrentUser() person: User) {
    return this.venues.create(dto, person);
  }

  @ApiBearerAuth()
  @Roles('admin')
  @ApiAnswer('VenueView')
  @Patch('venues/:id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateVenueDto, @CurrentUser() person: User) {
    return this.venues.update(id, dto, person);
  }

  @ApiBearerAuth()
  @Roles('admin')
  @ForOrganisation()
  @ApiNoBody()
  @Delete('venues/:id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.venues.delete(id, person);
  }
}
