import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { NotificationsModule } from '../notifications/notifications.module.js';
import { Revision } from '../revisions/models/revision.model.js';
import { User } from '../users/models/user.model.js';
import { CommentsController } from './comments.controller.js';
import { CommentsService } from './comments.service.js';
import { Comment } from './models/comment.model.js';

@Module({
  imports: [SequelizeModule.forFeature([Comment, Revision, User]), NotificationsModule],
  controllers: [CommentsController],
  providers: [CommentsService],
  exports: [CommentsService],
})
export class CommentsModule {}
