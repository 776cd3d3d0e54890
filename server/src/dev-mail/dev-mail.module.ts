import { Module } from '@nestjs/common';
import { DevMailController } from './dev-mail.controller.js';
import { DevMailService } from './dev-mail.service.js';

@Module({ controllers: [DevMailController], providers: [DevMailService] })
export class DevMailModule {}
