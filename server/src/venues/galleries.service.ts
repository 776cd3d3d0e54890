import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { GalleryView } from '@mantlepiece/shared';
import { Gallery } from './models/gallery.model.js';
import { SETTINGS_KEEPERS } from './station-policy.js';
import { SettingsService } from './settings.service.js';
import { toGalleryView } from './venues.presenter.js';

@Injectable()
export class GalleriesService extends SettingsService<Gallery, GalleryView> {
  constructor(@InjectModel(Gallery) galleries: typeof Gallery) {
    super(galleries, {
      label: 'gallery',
      toView: toGalleryView,
      inUse: 'This gallery still has stations or exhibits; delete or move them first.',
      parentKey: 'venueId',
      venue: { column: 'venueId', of: (gallery) => gallery.venueId, ofParent: (venueId) => Promise.resolve(venueId) },
      keepers: SETTINGS_KEEPERS,
    });
  }
}
