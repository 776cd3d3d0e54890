import { Body, Controller, Get, Param, ParseIntPipe, Put, Query, Res, UnsupportedMediaTypeException, UseFilters } from '@nestjs/common';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import { VersionConflictFilter } from '../common/version-conflict.js';
import type { User } from '../users/models/user.model.js';
import { ListUnitsQuery, ListWorklistQuery, SaveTranslationUnitDto } from './dto/translation.dto.js';
import { localeParam } from './translation-access.js';
import { TranslationsService } from './translations.service.js';
import { XLIFF_MEDIA_TYPES, XliffExchangeService } from './xliff-exchange.service.js';
import { ApiAnswer, ApiFileAnswer } from '../openapi/api-answer.decorator.js';

/**
 * Translators work in their own locales (the service checks each one); admins and curators read
 * every locale. Only translators write.
 */
@ApiTags('translations')
@ApiBearerAuth()
@Roles('admin', 'curator', 'translator')
@UseFilters(VersionConflictFilter)
@Controller()
export class TranslationsController {
  constructor(
    private readonly translations: TranslationsService,
    private readonly xliff: XliffExchangeService,
  ) {}

  @ApiAnswer('TranslationWorklistPage')
  @Get('translations/stories')
  worklist(@CurrentUser() user: User, @Query() query: ListWorklistQuery) {
    return this.translations.worklist(user, query);
  }

  @ApiAnswer('StoryTranslationsView')
  @Get('stories/:id/translations')
  storyTranslations(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number) {
    return this.translations.storyTranslations(user, id);
  }

  @ApiAnswer('TranslationUnitPage')
  @Get('stories/:id/translations/:locale/units')
  units(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number, @Param('locale') locale: string, @Query() query: ListUnitsQuery) {
    return this.translations.listUnits(user, id, localeParam(locale), query);
  }

  @Roles('translator')
  @ApiAnswer('SavedTranslationUnit')
  @Put('stories/:id/translations/:locale/units/:unitId')
  saveUnit(
    @CurrentUser() user: User,
    @Param('id', ParseIntPipe) id: number,
    @Param('locale') locale: string,
    @Param('unitId') unitId: string,
    @Body() dto: SaveTranslationUnitDto,
  ) {
    return this.translations.saveUnit(user, id, localeParam(locale), unitId, dto);
  }

  @ApiAnswer('TranslationPreviewView')
  @Get('stories/:id/translations/:locale/preview')
  preview(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number, @Param('locale') locale: string) {
    return this.translations.preview(user, id, localeParam(locale));
  }

  @ApiProduces('application/xliff+xml')
  @ApiFileAnswer('application/xliff+xml', 'The story in the locale as an XLIFF 2.0 file.', { binary: false })
  @Get('stories/:id/translations/:locale/xliff')
  async exportXliff(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number, @Param('locale') locale: string, @Res({ passthrough: true }) res: Response) {
    const { filename, xml } = await this.xliff.exportStory(user, id, localeParam(locale));
    res.type('application/xliff+xml; charset=utf-8').attachment(filename);
    return xml;
  }

  @Roles('translator')
  @ApiConsumes(...XLIFF_MEDIA_TYPES)
  @ApiBody({ description: 'The XLIFF 2.0 or 2.1 document itself', schema: { type: 'string' } })
  @ApiAnswer('XliffImportResult')
  @Put('stories/:id/translations/:locale/xliff')
  importXliff(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number, @Param('locale') locale: string, @Body() body: unknown) {
    if (typeof body !== 'string') throw new UnsupportedMediaTypeException('Send the XLIFF document itself as the body, with Content-Type: application/xliff+xml.');
    return this.xliff.importStory(user, id, localeParam(locale), body);
  }
}
