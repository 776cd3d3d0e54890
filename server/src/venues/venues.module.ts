import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Gallery } from './models/gallery.model.js';
import { Station } from './models/station.model.js';
import { Venue } from './models/venue.model.js';
import { VenuesController } from './venues.controller.js';
import { VenuesService } from './venues.service.js';

@Module({
  imports: [SequelizeModule.forFeature([Venue, Gallery, Station])],
  controllers: [VenuesController],
  providers: [VenuesService],
  exports: [VenuesService],
})
export class VenuesModule {}
