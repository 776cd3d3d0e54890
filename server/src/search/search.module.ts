import { Module } from '@nestjs/common';
import { MediaModule } from '../media/media.module.js';
import { StoriesModule } from '../stories/stories.module.js';
import { UsersModule } from '../users/users.module.js';
import { SearchController } from './search.controller.js';
import { SearchService } from './search.service.js';

/** Global search: the studio's one box over stories, media and people. */
@Module({
  imports: [StoriesModule, MediaModule, UsersModule],
  controllers: [SearchController],
  providers: [SearchService],
})
export class SearchModule {}
