import { Module } from '@nestjs/common';
import { AuditModule } from './audit/audit.module.js';
import { AuthModule } from './auth/auth.module.js';
import { ClockModule } from './clock/clock.module.js';
import { CommentsModule } from './comments/comments.module.js';
import { ConfigModule } from './config/config.module.js';
import { DatabaseModule } from './database/database.module.js';
import { DeletionsModule } from './deletions/deletions.module.js';
import { DevMailModule } from './dev-mail/dev-mail.module.js';
import { ExhibitsModule } from './exhibits/exhibits.module.js';
import { FleetModule } from './fleet/fleet.module.js';
import { HealthModule } from './health/health.module.js';
import { InsightsModule } from './insights/insights.module.js';
import { JobsModule } from './jobs/jobs.module.js';
import { KiosksModule } from './kiosks/kiosks.module.js';
import { MailModule } from './mail/mail.module.js';
import { MediaModule } from './media/media.module.js';
import { MyWorkModule } from './my-work/my-work.module.js';
import { NotificationsModule } from './notifications/notifications.module.js';
import { PanelsModule } from './panels/panels.module.js';
import { ReleasesModule } from './releases/releases.module.js';
import { ReviewsModule } from './reviews/reviews.module.js';
import { SearchModule } from './search/search.module.js';
import { RevisionsModule } from './revisions/revisions.module.js';
import { StoriesModule } from './stories/stories.module.js';
import { TranslationsModule } from './translations/translations.module.js';
import { UsersModule } from './users/users.module.js';
import { VenuesModule } from './venues/venues.module.js';
import { WidgetsModule } from './widgets/widgets.module.js';

@Module({
  imports: [
    ConfigModule, ClockModule, DatabaseModule, JobsModule, AuditModule, MailModule, UsersModule, AuthModule,
    DevMailModule, HealthModule, VenuesModule, WidgetsModule,
    ExhibitsModule, StoriesModule, PanelsModule, MediaModule, TranslationsModule,
    NotificationsModule, CommentsModule, RevisionsModule, ReviewsModule,
    ReleasesModule, KiosksModule, FleetModule, InsightsModule, MyWorkModule, DeletionsModule, SearchModule,
  ],
})
export class AppModule {}
