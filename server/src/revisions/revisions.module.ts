import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { CommentsModule } from '../comments/comments.module.js';
import { Exhibit } from '../exhibits/models/exhibit.model.js';
import { MediaAltText } from '../media/models/media-alt-text.model.js';
import { MediaAsset } from '../media/models/media-asset.model.js';
import { PanelDocument } from '../panels/models/panel-document.model.js';
import { Panel } from '../panels/models/panel.model.js';
import { Review } from '../reviews/models/review.model.js';
import { Story } from '../stories/models/story.model.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { Revision } from './models/revision.model.js';
import { RevisionsController } from './revisions.controller.js';
import { RevisionsService } from './revisions.service.js';

@Module({
  imports: [SequelizeModule.forFeature([Revision, Review, Story, Panel, PanelDocument, MediaAsset, MediaAltText, Exhibit, Gallery, Venue]), CommentsModule],
  controllers: [RevisionsController],
  providers: [RevisionsService],
  exports: [RevisionsService],
})
export class RevisionsModule {}
