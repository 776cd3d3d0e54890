import { Module } from '@nestjs/common';
import { MulterModule } from '@nestjs/platform-express';
import { SequelizeModule } from '@nestjs/sequelize';
import { ConfigService } from '../config/config.service.js';
import { PanelMediaUsage } from '../panels/models/panel-media-usage.model.js';
import { Panel } from '../panels/models/panel.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { Story } from '../stories/models/story.model.js';
import { ImageProcessing } from './image-processing.js';
import { MediaFilesController } from './media-files.controller.js';
import { MAX_FILES_PER_UPLOAD, MediaController } from './media.controller.js';
import { MediaService } from './media.service.js';
import { MEDIA_STORE } from './media-store.js';
import { mediaStoreOf } from './media-store.factory.js';
import { MediaAltText } from './models/media-alt-text.model.js';
import { MediaAsset } from './models/media-asset.model.js';
import { MediaRendition } from './models/media-rendition.model.js';
import { RenditionsController } from './renditions.controller.js';
import { RenditionsService } from './renditions.service.js';
import { RenditionsWorker } from './renditions.worker.js';

@Module({
  imports: [
    SequelizeModule.forFeature([MediaAsset, MediaRendition, MediaAltText, PanelMediaUsage, Panel, Story, Venue]),
    // No storage given, so multer keeps each file in memory: the bytes are checked and hashed before
    // anything is written. Past the size limit multer stops reading and Nest answers 413.
    MulterModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService) => ({ limits: { fileSize: config.mediaMaxBytes, files: MAX_FILES_PER_UPLOAD } }),
    }),
  ],
  controllers: [MediaController, RenditionsController, MediaFilesController],
  providers: [
    MediaService,
    ImageProcessing,
    RenditionsWorker,
    RenditionsService,
    { provide: MEDIA_STORE, inject: [ConfigService], useFactory: mediaStoreOf },
  ],
  exports: [MediaService, RenditionsWorker, MEDIA_STORE],
})
export class MediaModule {}
