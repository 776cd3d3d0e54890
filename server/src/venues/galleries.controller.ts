import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { CreateGalleryDto, ListGalleriesQuery, UpdateGalleryDto } from './dto/gallery.dto.js';
import { GalleriesService } from './galleries.service.js';
import { ApiAnswer, ApiNoBody } from '../openapi/api-answer.decorator.js';

@ApiTags('galleries')
@ApiBearerAuth()
@Roles('admin')
@Controller('galleries')
export class GalleriesController {
  constructor(private readonly galleries: GalleriesService) {}

  @Roles(...ROLES)
  @ApiAnswer('GalleryPage')
  @Get()
  list(@Query() query: ListGalleriesQuery, @CurrentUser() person: User) {
    return this.galleries.list(query, person);
  }

  @Roles(...ROLES)
  @ApiAnswer('GalleryView')
  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.galleries.get(id, person);
  }

  @ApiAnswer('GalleryView', { status: HttpStatus.CREATED })
  @Post()
  create(@Body() dto: CreateGalleryDto, @CurrentUser() person: User) {
    return this.galleries.create(dto, person);
  }

  @ApiAnswer('GalleryView')
  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateGalleryDto, @CurrentUser() person: User) {
    return this.galleries.update(id, dto, person);
  }

  @ApiNoBody()
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.galleries.delete(id, person);
  }
}
