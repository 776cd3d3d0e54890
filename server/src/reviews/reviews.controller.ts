import { Body, Controller, Get, Param, ParseIntPipe, Post, Query, HttpStatus } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { STORY_WORKFLOW } from '@mantlepiece/shared';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { RecordVerdictDto, ReviewQueueQuery } from './dto/review.dto.js';
import { ReviewsService } from './reviews.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

/** The educator's side of review: the queue and verdicts. */
@ApiTags('reviews')
@ApiBearerAuth()
@Roles(...STORY_WORKFLOW.approve.roles)
@Controller()
export class ReviewsController {
  constructor(private readonly reviews: ReviewsService) {}

  @ApiAnswer('ReviewQueuePage')
  @Get('reviews/queue')
  queue(@Query() query: ReviewQueueQuery, @CurrentUser() educator: User) {
    return this.reviews.queue(query, educator);
  }

  @ApiAnswer('VerdictResult', { status: HttpStatus.CREATED })
  @Post('revisions/:id/reviews')
  recordVerdict(@Param('id', ParseIntPipe) revisionId: number, @CurrentUser() educator: User, @Body() dto: RecordVerdictDto) {
    return this.reviews.recordVerdict(revisionId, educator, dto);
  }
}
