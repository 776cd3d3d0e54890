import { Body, Controller, Delete, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Put, UseFilters } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Roles } from '../auth/auth.decorators.js';
import { VersionConflictFilter } from '../common/version-conflict.js';
import { STORY_WRITERS } from '../stories/story-policy.js';
import { CreatePanelDto, ReorderPanelsDto, SavePanelDocumentDto, UpdatePanelDto } from './dto/panel.dto.js';
import { PanelsService } from './panels.service.js';

/** Panels are read with their story (GET /api/stories/:id); these are the curator's writes. */
@ApiTags('panels')
@ApiBearerAuth()
@Roles(...STORY_WRITERS)
@UseFilters(VersionConflictFilter)
@Controller()
export class PanelsController {
  constructor(private readonly panels: PanelsService) {}

  @Post('stories/:storyId/panels')
  add(@Param('storyId', ParseIntPipe) storyId: number, @Body() dto: CreatePanelDto) {
    return this.panels.addPanel(storyId, dto);
  }

  @Post('stories/:storyId/panels/reorder')
  @HttpCode(HttpStatus.OK)
  reorder(@Param('storyId', ParseIntPipe) storyId: number, @Body() dto: ReorderPanelsDto) {
    return this.panels.reorder(storyId, dto.panelIds);
  }

  @Put('panels/:id')
  save(@Param('id', ParseIntPipe) id: number, @Body() dto: SavePanelDocumentDto) {
    return this.panels.saveDocument(id, dto);
  }

  @Patch('panels/:id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdatePanelDto) {
    return this.panels.updatePanel(id, dto);
  }

  @Delete('panels/:id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number) {
    return this.panels.deletePanel(id);
  }
}
