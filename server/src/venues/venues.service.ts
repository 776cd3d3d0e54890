import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { VenueView } from '@mantlepiece/shared';
import type { Person } from '../auth/policy.js';
import { invalidField } from '../common/validation.js';
import { VenueSigningKeysService } from '../releases/venue-signing-keys.service.js';
import type { CreateVenueDto, UpdateVenueDto } from './dto/venue.dto.js';
import { Venue } from './models/venue.model.js';
import { SettingsService } from './settings.service.js';
import { toVenueView } from './venues.presenter.js';

@Injectable()
export class VenuesService extends SettingsService<Venue, VenueView> {
  constructor(
    @InjectModel(Venue) private readonly venues: typeof Venue,
    private readonly signingKeys: VenueSigningKeysService,
  ) {
    super(venues, { label: 'venue', toView: toVenueView, inUse: 'This venue still has galleries; delete or move them first.' });
  }

  /** The venue a kiosk shows before it is paired: the first one set up. */
  async kioskVenue() {
    const venue = await this.venues.findOne({ order: [['id', 'ASC']] });
    if (!venue) throw new NotFoundException('No venue has been set up yet.');
    return toKioskVenueView(venue);
  }

  /** A new venue gets its release signing key at once. */
  override async create(dto: CreateVenueDto, person: Person) {
    assertLocales(dto.sourceLocale, dto.targetLocales);
    const venue = await super.create(dto, person);
    await this.signingKeys.createFor(venue.id);
    return venue;
  }

  override async update(id: number, dto: UpdateVenueDto, person: Person) {
    const venue = await this.find(id);
    assertLocales(dto.sourceLocale ?? venue.sourceLocale, dto.targetLocales ?? venue.targetLocales);
    return super.update(id, dto, person);
  }
}

/** Translating into the language a story is written in would be a copy, not a translation. */
function assertLocales(sourceLocale: string, targetLocales: string[]) {
  const index = targetLocales.indexOf(sourceLocale);
  if (index === -1) return;
  throw invalidField(['targetLocales', index], 'The source locale cannot also be a target locale.');
}

export function toKioskVenueView(venue: Venue) {
  return { name: venue.name, locales: [venue.sourceLocale, ...venue.targetLocales] };
}
