import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Exhibit } from '../exhibits/models/exhibit.model.js';
import { MediaModule } from '../media/media.module.js';
import { MediaAltText } from '../media/models/media-alt-text.model.js';
import { MediaAsset } from '../media/models/media-asset.model.js';
import { MediaRendition } from '../media/models/media-rendition.model.js';
import { PanelDocument } from '../panels/models/panel-document.model.js';
import { Panel } from '../panels/models/panel.model.js';
import { Revision } from '../revisions/models/revision.model.js';
import { RevisionsModule } from '../revisions/revisions.module.js';
import { Story } from '../stories/models/story.model.js';
import { TranslationsModule } from '../translations/translations.module.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { Publication } from './models/publication.model.js';
import { ReleaseFile } from './models/release-file.model.js';
import { ReleasePanel } from './models/release-panel.model.js';
import { ReleaseStory } from './models/release-story.model.js';
import { Release } from './models/release.model.js';
import { ReleaseBuildFaults } from './release-build-faults.js';
import { ReleaseBuilder } from './release-builder.js';
import { ReleaseChoicesService } from './release-choices.js';
import { ReleaseContentService } from './release-content.service.js';
import { ReleaseFileStore } from './release-file-store.js';
import { ReleasePreviewService } from './release-preview.service.js';
import { ReleaseTranslations } from './release-translations.js';
import { PublicationsService } from './publications.service.js';
import { ReleasesController } from './releases.controller.js';
import { ReleasesService } from './releases.service.js';
import { ReleasesWorker } from './releases.worker.js';
import { VenueSigningKeysModule } from './venue-signing-keys.module.js';

@Module({
  imports: [
    SequelizeModule.forFeature([
      Release, ReleaseStory, ReleasePanel, ReleaseFile, Publication, Gallery, Venue, Exhibit, Story, Revision, Panel, PanelDocument, MediaAsset, MediaRendition, MediaAltText,
    ]),
    MediaModule, RevisionsModule, TranslationsModule, VenueSigningKeysModule,
  ],
  controllers: [ReleasesController],
  providers: [
    ReleasesService, ReleasePreviewService, PublicationsService, ReleasesWorker, ReleaseBuilder, ReleaseContentService, ReleaseChoicesService, ReleaseFileStore,
    ReleaseTranslations, ReleaseBuildFaults,
  ],
  exports: [ReleasesService, ReleasesWorker, PublicationsService, ReleaseFileStore, VenueSigningKeysModule],
})
export class ReleasesModule {}
