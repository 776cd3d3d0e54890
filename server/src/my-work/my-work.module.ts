import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { FleetStatesModule } from '../fleet/fleet-states.module.js';
import { KiosksModule } from '../kiosks/kiosks.module.js';
import { MediaModule } from '../media/media.module.js';
import { Release } from '../releases/models/release.model.js';
import { ReviewsModule } from '../reviews/reviews.module.js';
import { StoriesModule } from '../stories/stories.module.js';
import { TranslationsModule } from '../translations/translations.module.js';
import { Invitation } from '../users/models/invitation.model.js';
import { MyWorkController } from './my-work.controller.js';
import { MyWorkService } from './my-work.service.js';

@Module({
  imports: [SequelizeModule.forFeature([Release, Invitation]), StoriesModule, ReviewsModule, TranslationsModule, KiosksModule, FleetStatesModule, MediaModule],
  controllers: [MyWorkController],
  providers: [MyWorkService],
})
export class MyWorkModule {}
