import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Public } from '../auth/auth.decorators.js';
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
}
