import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Gallery } from '../venues/models/gallery.model.js';
import { InsightsController } from './insights.controller.js';
import { InsightsService } from './insights.service.js';

/** What visitors use, counted from anonymous kiosk events. */
@Module({
  imports: [SequelizeModule.forFeature([Gallery])],
  controllers: [InsightsController],
  providers: [InsightsService],
})
export class InsightsModule {}
