import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Venue } from './models/venue.model.js';

@Injectable()
export class VenuesService {
  constructor(@InjectModel(Venue) private readonly venues: typeof Venue) {}

  /** The venue a kiosk shows before it is paired: the first one set up. */
  async kioskVenue() {
    const venue = await this.venues.findOne({ order: [['id', 'ASC']] });
    if (!venue) throw new NotFoundException('No venue has been set up yet.');
    return toKioskVenueView(venue);
  }
}

export function toKioskVenueView(venue: Venue) {
  return { name: venue.name, locales: [venue.sourceLocale, ...venue.targetLocales] };
}
