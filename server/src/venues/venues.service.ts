import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { VenueView } from '@mantlepiece/shared';
import type { Member } from '../auth/policy.js';
import { invalidField } from '../common/validation.js';
import { VenueSigningKeysService } from '../releases/venue-signing-keys.service.js';
import type { CreateVenueDto, UpdateVenueDto } from './dto/venue.dto.js';
import { Gallery } from './models/gallery.model.js';
import { Venue } from './models/venue.model.js';
import { SETTINGS_KEEPERS } from './station-policy.js';
import { SettingsService } from './settings.service.js';
import { toVenueView } from './venues.presenter.js';

@Injectable()
export class VenuesService extends SettingsService<Venue, VenueView> {
  constructor(
    @InjectModel(Venue) private readonly venues: typeof Venue,
    @InjectModel(Gallery) private readonly galleries: typeof Gallery,
    private readonly signingKeys: VenueSigningKeysService,
  ) {
    super(venues, {
      label: 'venue',
      toView: toVenueView,
      inUse: 'This venue still has galleries; delete or move them first.',
      venue: { column: 'id', of: (venue) => venue.id },
      keepers: SETTINGS_KEEPERS,
    });
  }

  /**
   * The venue an unpaired kiosk shows: the one its install URL names by slug, else the only venue
   * there is; null when there are several and none is named.
   */
  async forUnpairedKiosk(slug: string | undefined) {
    if (slug !== undefined) {
      const venue = await this.venues.findOne({ where: { slug } });
      if (!venue) throw new NotFoundException('There is no such venue.');
      return toKioskVenueView(venue);
    }
    const venues = await this.venues.findAll({ order: [['id', 'ASC']], limit: 2 });
    return venues.length === 1 ? toKioskVenueView(venues[0]!) : null;
  }

  /** The venue a paired kiosk shows: its gallery's. */
  async forPairedKiosk(galleryId: number) {
    const gallery = await this.galleries.findByPk(galleryId, { attributes: ['id'], include: [Venue] });
    return toKioskVenueView(gallery!.venue!);
  }

  /** A new venue gets its release signing key at once. */
  override async create(dto: CreateVenueDto, member: Member) {
    assertLocales(dto.sourceLocale, dto.targetLocales);
    const venue = await super.create(dto, member);
    await this.signingKeys.createFor(venue.id);
    return venue;
  }

  /** Its own admins (a venue admin, or the organisation's) change a venue. */
  override async update(id: number, dto: UpdateVenueDto, member: Member) {
    const venue = await this.kept(id, member);
    assertLocales(dto.sourceLocale ?? venue.sourceLocale, dto.targetLocales ?? venue.targetLocales);
    return super.update(id, dto, member);
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
