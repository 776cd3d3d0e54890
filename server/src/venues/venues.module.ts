import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { VenueSigningKeysModule } from '../releases/venue-signing-keys.module.js';
import { GalleriesController } from './galleries.controller.js';
import { GalleriesService } from './galleries.service.js';
import { Gallery } from './models/gallery.model.js';
import { Station } from './models/station.model.js';
import { Venue } from './models/venue.model.js';
import { StationsController } from './stations.controller.js';
import { StationsService } from './stations.service.js';
import { VenuesController } from './venues.controller.js';
import { VenuesService } from './venues.service.js';

@Module({
  imports: [SequelizeModule.forFeature([Venue, Gallery, Station]), VenueSigningKeysModule],
  controllers: [VenuesController, GalleriesController, StationsController],
  providers: [VenuesService, GalleriesService, StationsService],
  exports: [VenuesService],
})
export class VenuesModule {}
