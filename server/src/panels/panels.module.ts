import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { MediaAsset } from '../media/models/media-asset.model.js';
import { Story } from '../stories/models/story.model.js';
import { PanelDocument } from './models/panel-document.model.js';
import { PanelMediaUsage } from './models/panel-media-usage.model.js';
import { Panel } from './models/panel.model.js';
import { PanelsController } from './panels.controller.js';
import { PanelsService } from './panels.service.js';

@Module({
  imports: [SequelizeModule.forFeature([Panel, PanelDocument, PanelMediaUsage, Story, MediaAsset])],
  controllers: [PanelsController],
  providers: [PanelsService],
  exports: [PanelsService],
})
export class PanelsModule {}
