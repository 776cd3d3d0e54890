import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { StationView } from '@mantlepiece/shared';
import { Gallery } from './models/gallery.model.js';
import { Station } from './models/station.model.js';
import { SETTINGS_KEEPERS } from './station-policy.js';
import { galleryVenue, SettingsService } from './settings.service.js';
import { toStationView } from './venues.presenter.js';

@Injectable()
export class StationsService extends SettingsService<Station, StationView> {
  constructor(@InjectModel(Station) stations: typeof Station, @InjectModel(Gallery) galleries: typeof Gallery) {
    super(stations, {
      label: 'station',
      toView: toStationView,
      inUse: 'A kiosk is paired to this station; unpair it first.',
      parentKey: 'galleryId',
      venue: galleryVenue(galleries),
      keepers: SETTINGS_KEEPERS,
    });
  }
}
