import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { OutboxMessage } from './models/outbox-message.model.js';
import { MailOutboxWorker } from './mail-outbox.worker.js';
import { MailService } from './mail.service.js';
import { MailTransport } from './mail-transport.js';

@Module({
  imports: [SequelizeModule.forFeature([OutboxMessage])],
  providers: [MailService, MailTransport, MailOutboxWorker],
  exports: [MailService, MailOutboxWorker],
})
export class MailModule {}
