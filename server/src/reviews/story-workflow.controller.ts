import { Body, Controller, HttpCode, HttpStatus, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { SubmitForReviewDto } from './dto/submit.dto.js';
import { ReviewsService } from './reviews.service.js';

/** The moves of a story through review that its curator makes. */
@ApiTags('stories')
@ApiBearerAuth()
@Controller('stories')
export class StoryWorkflowController {
  constructor(private readonly reviews: ReviewsService) {}

  @Post(':id/submit')
  @Roles('curator')
  submit(@Param('id', ParseIntPipe) id: number, @Body() dto: SubmitForReviewDto, @CurrentUser() curator: User) {
    return this.reviews.submitForReview(id, curator, dto);
  }

  @Post(':id/withdraw')
  @Roles('curator')
  @HttpCode(HttpStatus.OK)
  withdraw(@Param('id', ParseIntPipe) id: number, @CurrentUser() curator: User) {
    return this.reviews.withdrawSubmission(id, curator);
  }

  @Post(':id/revise')
  @Roles('curator')
  @HttpCode(HttpStatus.OK)
  revise(@Param('id', ParseIntPipe) id: number, @CurrentUser() curator: User) {
    return this.reviews.reviseStory(id, curator);
  }

  @Post(':id/retire')
  @Roles('curator', 'admin')
  @HttpCode(HttpStatus.OK)
  retire(@Param('id', ParseIntPipe) id: number, @CurrentUser() actor: User) {
    return this.reviews.retireStory(id, actor);
  }
}
