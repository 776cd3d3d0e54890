import { Module, RequestMethod, type MiddlewareConsumer, type NestModule } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import express from 'express';
import { Exhibit } from '../exhibits/models/exhibit.model.js';
import { MailModule } from '../mail/mail.module.js';
import { MediaAltText } from '../media/models/media-alt-text.model.js';
import { PanelDocument } from '../panels/models/panel-document.model.js';
import { Panel } from '../panels/models/panel.model.js';
import { Story } from '../stories/models/story.model.js';
import { User } from '../users/models/user.model.js';
import { UsersModule } from '../users/users.module.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { Translation } from './models/translation.model.js';
import { TranslatorAssignment } from './models/translator-assignment.model.js';
import { SourceUnitsService } from './source-units.service.js';
import { TranslationNoticesJob } from './translation-notices.job.js';
import { TranslationsController } from './translations.controller.js';
import { TranslationsService } from './translations.service.js';
import { XLIFF_MAX_BYTES, XLIFF_MEDIA_TYPES, XliffExchangeService } from './xliff-exchange.service.js';

/** The models the translation services read; the seed module registers them too. */
export const TRANSLATION_MODELS = [Translation, TranslatorAssignment, Story, Exhibit, Gallery, Venue, Panel, PanelDocument, MediaAltText, User];

/** The services without mail or HTTP, for the seed. */
export const TRANSLATION_SERVICES = [SourceUnitsService, TranslationsService];

@Module({
  imports: [SequelizeModule.forFeature(TRANSLATION_MODELS), MailModule, UsersModule],
  controllers: [TranslationsController],
  providers: [...TRANSLATION_SERVICES, XliffExchangeService, TranslationNoticesJob],
  exports: [TranslationsService, TranslationNoticesJob],
})
export class TranslationsModule implements NestModule {
  /** An XLIFF upload is the document itself, read as text; past the limit the parser stops and the API answers 413. */
  configure(consumer: MiddlewareConsumer): void {
    consumer
      .apply(express.text({ type: XLIFF_MEDIA_TYPES, limit: XLIFF_MAX_BYTES, defaultCharset: 'utf-8' }))
      .forRoutes({ path: 'stories/:id/translations/:locale/xliff', method: RequestMethod.PUT });
  }
}
