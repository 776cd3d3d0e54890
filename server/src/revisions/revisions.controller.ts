import { Controller, Get, Param, ParseIntPipe } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { RevisionsService } from './revisions.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

/** Read-only on purpose: a revision is never edited, only superseded by a new submission. */
@ApiTags('revisions')
@ApiBearerAuth()
@Roles(...ROLES)
@Controller()
export class RevisionsController {
  constructor(private readonly revisions: RevisionsService) {}

  @ApiAnswer('RevisionSummaryList')
  @Get('stories/:id/revisions')
  listForStory(@Param('id', ParseIntPipe) storyId: number, @CurrentUser() person: User) {
    return this.revisions.listForStory(storyId, person);
  }

  /** The shared preflight on the story's draft as it stands; a revision keeps its own from submission. */
  @ApiAnswer('PreflightEntryList')
  @Get('stories/:id/preflight')
  draftPreflight(@Param('id', ParseIntPipe) storyId: number, @CurrentUser() person: User) {
    return this.revisions.draftPreflight(storyId, person);
  }

  @ApiAnswer('RevisionView')
  @Get('revisions/:id')
  get(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.revisions.get(id, person);
  }

  @ApiAnswer('RevisionComparison')
  @Get('revisions/:id/compare')
  compare(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.revisions.compare(id, person);
  }
}
