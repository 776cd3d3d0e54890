import { Body, Controller, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import { withinReach } from '../common/venue-boundary.js';
import type { User } from '../users/models/user.model.js';
import { CompareReleasesQuery, ListReleasesQuery, ReleasePreviewQuery, RequestReleaseDto } from './dto/release.dto.js';
import { ReleasePreviewService } from './release-preview.service.js';
import { ReleasesService } from './releases.service.js';
import { PUBLISHERS } from './release-policy.js';
import { VenueSigningKeysService } from './venue-signing-keys.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

@ApiTags('releases')
@ApiBearerAuth()
@Controller()
export class ReleasesController {
  constructor(
    private readonly releases: ReleasesService,
    private readonly previews: ReleasePreviewService,
    private readonly keys: VenueSigningKeysService,
  ) {}

  @Roles(...PUBLISHERS)
  @ApiAnswer('ReleaseRequested', { status: HttpStatus.ACCEPTED })
  @Post('galleries/:id/releases')
  @HttpCode(HttpStatus.ACCEPTED)
  request(@Param('id', ParseIntPipe) galleryId: number, @Body() dto: RequestReleaseDto, @CurrentUser() user: User) {
    return this.releases.requestRelease(galleryId, dto, user);
  }

  /** What a build with these revisions and choices would carry and miss, before asking for it. */
  @Roles(...PUBLISHERS)
  @ApiAnswer('ReleasePreview')
  @Get('galleries/:id/releases/preview')
  preview(@Param('id', ParseIntPipe) galleryId: number, @Query() query: ReleasePreviewQuery, @CurrentUser() user: User) {
    return this.previews.preview(galleryId, query, user);
  }

  @Roles(...ROLES)
  @ApiAnswer('ReleasePage')
  @Get('galleries/:id/releases')
  list(@Param('id', ParseIntPipe) galleryId: number, @Query() query: ListReleasesQuery, @CurrentUser() person: User) {
    return this.releases.listForGallery(galleryId, query, person);
  }

  @Roles(...ROLES)
  @ApiAnswer('ReleaseComparison')
  @Get('releases/compare')
  compare(@Query() { a, b }: CompareReleasesQuery, @CurrentUser() person: User) {
    return this.releases.compare(a, b, person);
  }

  @Roles(...ROLES)
  @ApiAnswer('ReleaseView')
  @Get('releases/:id')
  get(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.releases.read(id, person);
  }

  @Roles(...ROLES)
  @ApiAnswer('ManifestResponse')
  @Get('releases/:id/manifest')
  manifest(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.releases.signedManifest(id, person);
  }

  @Roles(...PUBLISHERS)
  @ApiAnswer('ReleaseView')
  @Post('releases/:id/publish')
  @HttpCode(HttpStatus.OK)
  publish(@Param('id', ParseIntPipe) id: number, @CurrentUser() user: User) {
    return this.releases.publish(id, user);
  }

  /** What a kiosk checks release signatures with, for staff to compare with the one a kiosk holds. */
  @Roles(...ROLES)
  @ApiAnswer('SigningKeyView')
  @Get('venues/:id/signing-key')
  async signingKey(@Param('id', ParseIntPipe) venueId: number, @CurrentUser() person: User) {
    withinReach(person, { venueId }, 'There is no such venue.');
    return { venueId, algorithm: 'Ed25519', publicKey: await this.keys.publicKeyOf(venueId) };
  }
}
