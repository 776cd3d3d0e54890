import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Venue } from '../venues/models/venue.model.js';
import { VenueSigningKey } from './models/venue-signing-key.model.js';
import { VenueSigningKeysService } from './venue-signing-keys.service.js';

/** Apart from releases so the venues module can make a new venue's key without importing release building. */
@Module({
  imports: [SequelizeModule.forFeature([VenueSigningKey, Venue])],
  providers: [VenueSigningKeysService],
  exports: [VenueSigningKeysService],
})
export class VenueSigningKeysModule {}
