import { Controller, Get, Param, ParseIntPipe } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { Roles } from '../auth/auth.decorators.js';
import { RevisionsService } from './revisions.service.js';

/** Read-only on purpose: a revision is never edited, only superseded by a new submission. */
@ApiTags('revisions')
@ApiBearerAuth()
@Roles(...ROLES)
@Controller()
export class RevisionsController {
  constructor(private readonly revisions: RevisionsService) {}

  @Get('stories/:id/revisions')
  listForStory(@Param('id', ParseIntPipe) storyId: number) {
    return this.revisions.listForStory(storyId);
  }

  /** The shared preflight on the story's draft as it stands; a revision keeps its own from submission. */
  @Get('stories/:id/preflight')
  draftPreflight(@Param('id', ParseIntPipe) storyId: number) {
    return this.revisions.draftPreflight(storyId);
  }

  @Get('revisions/:id')
  get(@Param('id', ParseIntPipe) id: number) {
    return this.revisions.get(id);
  }

  @Get('revisions/:id/compare')
  compare(@Param('id', ParseIntPipe) id: number) {
    return this.revisions.compare(id);
  }
}
