import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { FleetStatesModule } from '../fleet/fleet-states.module.js';
import { ReleaseFile } from '../releases/models/release-file.model.js';
import { ReleasePanel } from '../releases/models/release-panel.model.js';
import { ReleaseStory } from '../releases/models/release-story.model.js';
import { Release } from '../releases/models/release.model.js';
import { RateLimitsModule } from '../rate-limits/rate-limits.module.js';
import { ReleasesModule } from '../releases/releases.module.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Station } from '../venues/models/station.model.js';
import { VenuesModule } from '../venues/venues.module.js';
import { DeviceTokenGuard, OptionalDeviceTokenGuard } from './device-token.guard.js';
import { KioskController } from './kiosk.controller.js';
import { KioskReleasesService } from './kiosk-releases.service.js';
import { KiosksController } from './kiosks.controller.js';
import { KiosksService } from './kiosks.service.js';
import { KioskEvent } from './models/kiosk-event.model.js';
import { KioskHeartbeat } from './models/kiosk-heartbeat.model.js';
import { Kiosk } from './models/kiosk.model.js';
import { PairingRequest } from './models/pairing-request.model.js';
import { PairingAttemptsService } from './pairing-attempts.service.js';
import { PairingService } from './pairing.service.js';
import { PairedKioskReader } from './paired-kiosk-reader.js';

@Module({
  imports: [
    SequelizeModule.forFeature([Kiosk, PairingRequest, KioskHeartbeat, KioskEvent, Station, Gallery, Release, ReleaseFile, ReleaseStory, ReleasePanel]),
    ReleasesModule, FleetStatesModule, RateLimitsModule, VenuesModule,
  ],
  controllers: [KioskController, KiosksController],
  providers: [PairingService, PairingAttemptsService, KiosksService, KioskReleasesService, PairedKioskReader, DeviceTokenGuard, OptionalDeviceTokenGuard],
  exports: [KiosksService],
})
export class KiosksModule {}
