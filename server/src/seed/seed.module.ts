import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { AuditModule } from '../audit/audit.module.js';
import { ClockModule } from '../clock/clock.module.js';
import { ConfigModule } from '../config/config.module.js';
import { DatabaseModule } from '../database/database.module.js';
import { Exhibit } from '../exhibits/models/exhibit.model.js';
import { JobsModule } from '../jobs/jobs.module.js';
import { KioskEvent } from '../kiosks/models/kiosk-event.model.js';
import { KioskHeartbeat } from '../kiosks/models/kiosk-heartbeat.model.js';
import { Kiosk } from '../kiosks/models/kiosk.model.js';
import { MediaModule } from '../media/media.module.js';
import { PanelsModule } from '../panels/panels.module.js';
import { ReleasesModule } from '../releases/releases.module.js';
import { ReviewsModule } from '../reviews/reviews.module.js';
import { Revision } from '../revisions/models/revision.model.js';
import { Story } from '../stories/models/story.model.js';
import { TRANSLATION_MODELS, TRANSLATION_SERVICES } from '../translations/translations.module.js';
import { User } from '../users/models/user.model.js';
import { VenueMembership } from '../users/models/venue-membership.model.js';
import { PasswordHasher } from '../users/password-hasher.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Station } from '../venues/models/station.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { DemoFleet } from './demo-fleet.js';
import { DemoReviews } from './demo-reviews.js';
import { DemoSecondVenue } from './demo-second-venue.js';
import { DemoStories } from './demo-stories.js';
import { DemoTranslations } from './demo-translations.js';
import { SeedService } from './seed.service.js';

/** What the CLI's seed and create-admin need: the database and the release builder, no HTTP and no mail worker. */
@Module({
  imports: [
    ConfigModule, ClockModule, DatabaseModule, JobsModule, AuditModule,
    SequelizeModule.forFeature([User, VenueMembership, Venue, Gallery, Station, Exhibit, Story, Revision, Kiosk, KioskHeartbeat, KioskEvent, ...TRANSLATION_MODELS]),
    MediaModule, PanelsModule, ReviewsModule, ReleasesModule,
  ],
  providers: [SeedService, PasswordHasher, DemoStories, DemoSecondVenue, DemoReviews, DemoTranslations, DemoFleet, ...TRANSLATION_SERVICES],
})
export class SeedModule {}
