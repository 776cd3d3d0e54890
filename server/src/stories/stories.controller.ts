import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { CreateStoryDto, ListStoriesQuery, UpdateStoryDto } from './dto/story.dto.js';
import { StoriesService } from './stories.service.js';
import { STORY_WRITERS } from './story-policy.js';
import { ApiAnswer, ApiNoBody } from '../openapi/api-answer.decorator.js';

@ApiTags('stories')
@ApiBearerAuth()
@Roles(...STORY_WRITERS)
@Controller('stories')
export class StoriesController {
  constructor(private readonly stories: StoriesService) {}

  @Roles(...ROLES)
  @ApiAnswer('StoryPage')
  @Get()
  list(@Query() query: ListStoriesQuery, @CurrentUser() person: User) {
    return this.stories.list(query, person);
  }

  @Roles(...ROLES)
  @ApiAnswer('StoryDetailView')
  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.stories.get(id, person);
  }

  @ApiAnswer('StoryView', { status: HttpStatus.CREATED })
  @Post()
  create(@CurrentUser() author: User, @Body() dto: CreateStoryDto) {
    return this.stories.createStory(author, dto);
  }

  @ApiAnswer('StoryView')
  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateStoryDto, @CurrentUser() person: User) {
    return this.stories.updateStory(id, dto, person);
  }

  @ApiNoBody()
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.stories.deleteStory(id, person);
  }
}
