import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { ExhibitsController } from './exhibits.controller.js';
import { ExhibitsService } from './exhibits.service.js';
import { Exhibit } from './models/exhibit.model.js';

@Module({
  imports: [SequelizeModule.forFeature([Exhibit])],
  controllers: [ExhibitsController],
  providers: [ExhibitsService],
  exports: [ExhibitsService],
})
export class ExhibitsModule {}
