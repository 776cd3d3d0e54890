import { Body, Controller, HttpCode, HttpStatus, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { STORY_WORKFLOW } from '@mantlepiece/shared';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { SubmitForReviewDto } from './dto/submit.dto.js';
import { ReviewsService } from './reviews.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

/** The moves of a story through review that its curator makes; who may call each is the shared workflow's table, which `decide` and the story policy read too. */
@ApiTags('stories')
@ApiBearerAuth()
@Controller('stories')
export class StoryWorkflowController {
  constructor(private readonly reviews: ReviewsService) {}

  @ApiAnswer('SubmitResult', { status: HttpStatus.CREATED })
  @Post(':id/submit')
  @Roles(...STORY_WORKFLOW.submit.roles)
  submit(@Param('id', ParseIntPipe) id: number, @Body() dto: SubmitForReviewDto, @CurrentUser() curator: User) {
    return this.reviews.submitForReview(id, curator, dto);
  }

  @ApiAnswer('StoryView')
  @Post(':id/withdraw')
  @Roles(...STORY_WORKFLOW.withdraw.roles)
  @HttpCode(HttpStatus.OK)
  withdraw(@Param('id', ParseIntPipe) id: number, @CurrentUser() curator: User) {
    return this.reviews.withdrawSubmission(id, curator);
  }

  @ApiAnswer('StoryView')
  @Post(':id/revise')
  @Roles(...STORY_WORKFLOW.revise.roles)
  @HttpCode(HttpStatus.OK)
  revise(@Param('id', ParseIntPipe) id: number, @CurrentUser() curator: User) {
    return this.reviews.reviseStory(id, curator);
  }

  @ApiAnswer('StoryView')
  @Post(':id/retire')
  @Roles(...STORY_WORKFLOW.retire.roles)
  @HttpCode(HttpStatus.OK)
  retire(@Param('id', ParseIntPipe) id: number, @CurrentUser() actor: User) {
    return this.reviews.retireStory(id, actor);
  }
}
