import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { CreateStoryDto, ListStoriesQuery, UpdateStoryDto } from './dto/story.dto.js';
import { StoriesService } from './stories.service.js';

@ApiTags('stories')
@ApiBearerAuth()
@Roles('curator')
@Controller('stories')
export class StoriesController {
  constructor(private readonly stories: StoriesService) {}

  @Roles(...ROLES)
  @Get()
  list(@Query() query: ListStoriesQuery) {
    return this.stories.list(query);
  }

  @Roles(...ROLES)
  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number) {
    return this.stories.get(id);
  }

  @Post()
  create(@CurrentUser() author: User, @Body() dto: CreateStoryDto) {
    return this.stories.createStory(author, dto);
  }

  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateStoryDto) {
    return this.stories.updateStory(id, dto);
  }

  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number) {
    return this.stories.deleteStory(id);
  }
}
