import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { StationView } from '@mantlepiece/shared';
import { Station } from './models/station.model.js';
import { SettingsService } from './settings.service.js';
import { toStationView } from './venues.presenter.js';

@Injectable()
export class StationsService extends SettingsService<Station, StationView> {
  constructor(@InjectModel(Station) stations: typeof Station) {
    super(stations, {
      label: 'station',
      toView: toStationView,
      inUse: 'A kiosk is paired to this station; unpair it first.',
      parentKey: 'galleryId',
    });
  }
}
