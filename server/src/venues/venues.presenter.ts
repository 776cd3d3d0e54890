import type { GalleryView, StationView, VenueView } from '@mantlepiece/shared';
import type { Person } from '../auth/policy.js';
import type { Gallery } from './models/gallery.model.js';
import type { Station } from './models/station.model.js';
import type { Venue } from './models/venue.model.js';
import { stationCan } from './station-policy.js';

export const toVenueView = (venue: Venue): VenueView => ({
  id: venue.id,
  name: venue.name,
  slug: venue.slug,
  sourceLocale: venue.sourceLocale,
  targetLocales: venue.targetLocales,
  fallbackToSource: venue.fallbackToSource,
  requiredApprovals: venue.requiredApprovals,
  timeZone: venue.timeZone,
  createdAt: venue.createdAt.toISOString(),
});

export const toGalleryView = (gallery: Gallery): GalleryView => ({ id: gallery.id, venueId: gallery.venueId, name: gallery.name });

export const toStationView = (station: Station, person: Person): StationView => ({
  id: station.id,
  galleryId: station.galleryId,
  name: station.name,
  screenWidthPx: station.screenWidthPx,
  screenHeightPx: station.screenHeightPx,
  orientation: station.orientation,
  mountingHeightMm: station.mountingHeightMm,
  can: stationCan(person),
});
