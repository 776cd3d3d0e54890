import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Gallery } from '../venues/models/gallery.model.js';
import { ExhibitsController } from './exhibits.controller.js';
import { ExhibitsService } from './exhibits.service.js';
import { Exhibit } from './models/exhibit.model.js';

@Module({
  imports: [SequelizeModule.forFeature([Exhibit, Gallery])],
  controllers: [ExhibitsController],
  providers: [ExhibitsService],
  exports: [ExhibitsService],
})
export class ExhibitsModule {}
