import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { Public, Roles } from '../auth/auth.decorators.js';
import { CreateVenueDto, UpdateVenueDto } from './dto/venue.dto.js';
import { ListSettingsQuery } from './settings.service.js';
import { VenuesService } from './venues.service.js';

@ApiTags('venues')
@Controller()
export class VenuesController {
  constructor(private readonly venues: VenuesService) {}

  /** Public: an unpaired kiosk has no account, and a venue's name and languages are no secret. */
  @Public()
  @Get('kiosk/venue')
  kioskVenue() {
    return this.venues.kioskVenue();
  }

  @ApiBearerAuth()
  @Roles(...ROLES)
  @Get('venues')
  list(@Query() query: ListSettingsQuery) {
    return this.venues.list(query);
  }

  @ApiBearerAuth()
  @Roles(...ROLES)
  @Get('venues/:id')
  get(@Param('id', ParseIntPipe) id: number) {
    return this.venues.get(id);
  }

  @ApiBearerAuth()
  @Roles('admin')
  @Post('venues')
  create(@Body() dto: CreateVenueDto) {
    return this.venues.create(dto);
  }

  @ApiBearerAuth()
  @Roles('admin')
  @Patch('venues/:id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateVenueDto) {
    return this.venues.update(id, dto);
  }

  @ApiBearerAuth()
  @Roles('admin')
  @Delete('venues/:id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number) {
    return this.venues.delete(id);
  }
}
