import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { KiosksModule } from '../kiosks/kiosks.module.js';
import { KioskHeartbeat } from '../kiosks/models/kiosk-heartbeat.model.js';
import { Kiosk } from '../kiosks/models/kiosk.model.js';
import { MailModule } from '../mail/mail.module.js';
import { Release } from '../releases/models/release.model.js';
import { UsersModule } from '../users/users.module.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Station } from '../venues/models/station.model.js';
import { FleetStatesModule } from './fleet-states.module.js';
import { FleetController } from './fleet.controller.js';
import { FleetService } from './fleet.service.js';
import { SilentKioskWatcher } from './silent-kiosk.watcher.js';

/** Watching the kiosks: a kiosk's page with its history, and mail when one goes silent or comes back. */
@Module({
  imports: [SequelizeModule.forFeature([Kiosk, KioskHeartbeat, Release, Station, Gallery]), KiosksModule, FleetStatesModule, MailModule, UsersModule],
  controllers: [FleetController],
  providers: [FleetService, SilentKioskWatcher],
})
export class FleetModule {}
