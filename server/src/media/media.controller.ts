import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Query, UploadedFiles, UseInterceptors } from '@nestjs/common';
import { FilesInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiConsumes, ApiTags } from '@nestjs/swagger';
import { ROLES, type LicenceIdsView } from '@mantlepiece/shared';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { ListMediaQuery, UpdateMediaDto, UploadMediaDto } from './dto/media.dto.js';
import { LICENCE_IDS_IN_SUGGESTION_ORDER } from './licence-ids.js';
import { MEDIA_KEEPERS } from './media-policy.js';
import { MediaService, type UploadedFile } from './media.service.js';
import { ApiAnswer, ApiNoBody } from '../openapi/api-answer.decorator.js';

/** How many images one upload may carry; the size limit per file comes from MEDIA_MAX_BYTES. */
export const MAX_FILES_PER_UPLOAD = 20;

@ApiTags('media')
@ApiBearerAuth()
@Roles(...MEDIA_KEEPERS)
@Controller('media')
export class MediaController {
  constructor(private readonly media: MediaService) {}

  @ApiAnswer('MediaList', { status: HttpStatus.CREATED })
  @Post()
  @ApiConsumes('multipart/form-data')
  @UseInterceptors(FilesInterceptor('file', MAX_FILES_PER_UPLOAD))
  upload(@CurrentUser() uploader: User, @UploadedFiles() files: UploadedFile[], @Body() fields: UploadMediaDto) {
    return this.media.upload(uploader, files, fields.venueId);
  }

  @Roles(...ROLES)
  @ApiAnswer('MediaPage')
  @Get()
  list(@Query() query: ListMediaQuery, @CurrentUser() person: User) {
    return this.media.list(query, person);
  }

  /** The SPDX identifiers a licence may name, in the order the studio suggests them; the server's check reads the same list. */
  @Roles(...ROLES)
  @ApiAnswer('LicenceIdsView')
  @Get('licences')
  licences(): LicenceIdsView {
    return { ids: LICENCE_IDS_IN_SUGGESTION_ORDER };
  }

  @Roles(...ROLES)
  @ApiAnswer('MediaView')
  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.media.get(id, person);
  }

  @ApiAnswer('MediaView')
  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateMediaDto, @CurrentUser() person: User) {
    return this.media.updateDetails(id, dto, person);
  }

  @ApiNoBody()
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.media.deleteAsset(id, person);
  }

  /** Undo of a delete, within the deletion grace (DELETION_GRACE_MS). */
  @ApiAnswer('MediaView')
  @Post(':id/restore')
  @HttpCode(HttpStatus.OK)
  restore(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.media.restoreAsset(id, person);
  }
}
