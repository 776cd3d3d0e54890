import { Controller, HttpCode, HttpStatus, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { MEDIA_KEEPERS } from './media-policy.js';
import { RenditionsService } from './renditions.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

@ApiTags('media')
@ApiBearerAuth()
@Roles(...MEDIA_KEEPERS)
@Controller('media/:id/renditions')
export class RenditionsController {
  constructor(private readonly renditions: RenditionsService) {}

  /** Makes a failed image's renditions again; the answer is its rendition status, now pending. */
  @ApiAnswer('RenditionStatus', { status: HttpStatus.ACCEPTED })
  @Post('retry')
  @HttpCode(HttpStatus.ACCEPTED)
  retry(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.renditions.retry(id, person);
  }
}
