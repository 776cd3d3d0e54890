import { Controller, HttpCode, HttpStatus, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { ReviewsService } from './reviews.service.js';

/** The moves of a story through review that its curator makes. */
@ApiTags('stories')
@ApiBearerAuth()
@Controller('stories')
export class StoryWorkflowController {
  constructor(private readonly reviews: ReviewsService) {}

  @Post(':id/submit')
  @Roles('curator')
  submit(@Param('id', ParseIntPipe) id: number, @CurrentUser() curator: User) {
    return this.reviews.submitForReview(id, curator);
  }

  @Post(':id/retire')
  @Roles('curator', 'admin')
  @HttpCode(HttpStatus.OK)
  retire(@Param('id', ParseIntPipe) id: number, @CurrentUser() actor: User) {
    return this.reviews.retireStory(id, actor);
  }
}
