import { Body, Controller, Param, ParseIntPipe, Patch, Post, HttpStatus } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { COMMENTERS } from './comment-policy.js';
import { CommentsService } from './comments.service.js';
import { CreateCommentDto, UpdateCommentDto } from './dto/comment.dto.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

/** Curators and educators talk about a revision here. */
@ApiTags('comments')
@ApiBearerAuth()
@Roles(...COMMENTERS)
@Controller()
export class CommentsController {
  constructor(private readonly comments: CommentsService) {}

  @ApiAnswer('CommentView', { status: HttpStatus.CREATED })
  @Post('revisions/:id/comments')
  add(@Param('id', ParseIntPipe) revisionId: number, @CurrentUser() author: User, @Body() dto: CreateCommentDto) {
    return this.comments.addComment(revisionId, author, dto);
  }

  @ApiAnswer('CommentView')
  @Patch('comments/:id')
  setResolved(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User, @Body() dto: UpdateCommentDto) {
    return this.comments.setResolved(id, person, dto.resolved);
  }
}
