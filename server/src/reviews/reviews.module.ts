import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { CommentsModule } from '../comments/comments.module.js';
import { NotificationsModule } from '../notifications/notifications.module.js';
import { Revision } from '../revisions/models/revision.model.js';
import { RevisionsModule } from '../revisions/revisions.module.js';
import { Story } from '../stories/models/story.model.js';
import { StoriesModule } from '../stories/stories.module.js';
import { User } from '../users/models/user.model.js';
import { UsersModule } from '../users/users.module.js';
import { Review } from './models/review.model.js';
import { ReviewsController } from './reviews.controller.js';
import { ReviewsService } from './reviews.service.js';
import { StoryWorkflowController } from './story-workflow.controller.js';

@Module({
  imports: [SequelizeModule.forFeature([Revision, Review, Story, User]), RevisionsModule, StoriesModule, CommentsModule, NotificationsModule, UsersModule],
  controllers: [StoryWorkflowController, ReviewsController],
  providers: [ReviewsService],
  exports: [ReviewsService],
})
export class ReviewsModule {}
