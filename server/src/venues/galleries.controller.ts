import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { Roles } from '../auth/auth.decorators.js';
import { CreateGalleryDto, ListGalleriesQuery, UpdateGalleryDto } from './dto/gallery.dto.js';
import { GalleriesService } from './galleries.service.js';

@ApiTags('galleries')
@ApiBearerAuth()
@Roles('admin')
@Controller('galleries')
export class GalleriesController {
  constructor(private readonly galleries: GalleriesService) {}

  @Roles(...ROLES)
  @Get()
  list(@Query() query: ListGalleriesQuery) {
    return this.galleries.list(query);
  }

  @Roles(...ROLES)
  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number) {
    return this.galleries.get(id);
  }

  @Post()
  create(@Body() dto: CreateGalleryDto) {
    return this.galleries.create(dto);
  }

  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateGalleryDto) {
    return this.galleries.update(id, dto);
  }

  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number) {
    return this.galleries.delete(id);
  }
}
