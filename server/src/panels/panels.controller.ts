import { Body, Controller, Delete, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Put, UseFilters } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { VersionConflictFilter } from '../common/version-conflict.js';
import { STORY_WRITERS } from '../stories/story-policy.js';
import { CreatePanelDto, ReorderPanelsDto, SavePanelDocumentDto, UpdatePanelDto } from './dto/panel.dto.js';
import { PanelsService } from './panels.service.js';
import { ApiAnswer, ApiNoBody } from '../openapi/api-answer.decorator.js';

/** Panels are read with their story (GET /api/stories/:id); these are the curator's writes. */
@ApiTags('panels')
@ApiBearerAuth()
@Roles(...STORY_WRITERS)
@UseFilters(VersionConflictFilter)
@Controller()
export class PanelsController {
  constructor(private readonly panels: PanelsService) {}

  @ApiAnswer('PanelView', { status: HttpStatus.CREATED })
  @Post('stories/:storyId/panels')
  add(@Param('storyId', ParseIntPipe) storyId: number, @Body() dto: CreatePanelDto, @CurrentUser() person: User) {
    return this.panels.addPanel(storyId, dto, person);
  }

  @ApiAnswer('PanelList')
  @Post('stories/:storyId/panels/reorder')
  @HttpCode(HttpStatus.OK)
  reorder(@Param('storyId', ParseIntPipe) storyId: number, @Body() dto: ReorderPanelsDto, @CurrentUser() person: User) {
    return this.panels.reorder(storyId, dto.panelIds, person);
  }

  @ApiAnswer('SavedPanelVersion')
  @Put('panels/:id')
  save(@Param('id', ParseIntPipe) id: number, @Body() dto: SavePanelDocumentDto, @CurrentUser() person: User) {
    return this.panels.saveDocument(id, dto, person);
  }

  @ApiAnswer('PanelView')
  @Patch('panels/:id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdatePanelDto, @CurrentUser() person: User) {
    return this.panels.updatePanel(id, dto, person);
  }

  @ApiNoBody()
  @Delete('panels/:id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.panels.deletePanel(id, person);
  }

  /** Undo of a delete, within the deletion grace (DELETION_GRACE_MS). */
  @ApiAnswer('PanelView')
  @Post('panels/:id/restore')
  @HttpCode(HttpStatus.OK)
  restore(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.panels.restorePanel(id, person);
  }
}
