import { Module } from '@nestjs/common';
import { WidgetsController } from './widgets.controller.js';
import { WidgetsService } from './widgets.service.js';

@Module({ controllers: [WidgetsController], providers: [WidgetsService], exports: [WidgetsService] })
export class WidgetsModule {}
