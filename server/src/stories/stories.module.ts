import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Exhibit } from '../exhibits/models/exhibit.model.js';
import { PanelDocument } from '../panels/models/panel-document.model.js';
import { Panel } from '../panels/models/panel.model.js';
import { PanelsModule } from '../panels/panels.module.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { Story } from './models/story.model.js';
import { StoriesController } from './stories.controller.js';
import { StoriesService } from './stories.service.js';

@Module({
  imports: [SequelizeModule.forFeature([Story, Exhibit, Gallery, Venue, Panel, PanelDocument]), PanelsModule],
  controllers: [StoriesController],
  providers: [StoriesService],
  exports: [StoriesService],
})
export class StoriesModule {}
