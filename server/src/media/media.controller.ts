import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Query, UploadedFiles, UseInterceptors } from '@nestjs/common';
import { FilesInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiConsumes, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { ListMediaQuery, UpdateMediaDto } from './dto/media.dto.js';
import { MediaService, type UploadedFile } from './media.service.js';

/** How many images one upload may carry; the size limit per file comes from MEDIA_MAX_BYTES. */
export const MAX_FILES_PER_UPLOAD = 20;

@ApiTags('media')
@ApiBearerAuth()
@Roles('curator')
@Controller('media')
export class MediaController {
  constructor(private readonly media: MediaService) {}

  @Post()
  @ApiConsumes('multipart/form-data')
  @UseInterceptors(FilesInterceptor('file', MAX_FILES_PER_UPLOAD))
  upload(@CurrentUser() uploader: User, @UploadedFiles() files: UploadedFile[]) {
    return this.media.upload(uploader, files);
  }

  @Roles(...ROLES)
  @Get()
  list(@Query() query: ListMediaQuery) {
    return this.media.list(query);
  }

  @Roles(...ROLES)
  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number) {
    return this.media.get(id);
  }

  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateMediaDto) {
    return this.media.updateDetails(id, dto);
  }

  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number) {
    return this.media.deleteAsset(id);
  }
}
