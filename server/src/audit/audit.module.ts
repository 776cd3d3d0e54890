import { Global, Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { AuditEvent } from './models/audit-event.model.js';
import { AuditController } from './audit.controller.js';
import { AuditService } from './audit.service.js';

/** Global: every feature records its events here. */
@Global()
@Module({
  imports: [SequelizeModule.forFeature([AuditEvent])],
  controllers: [AuditController],
  providers: [AuditService],
  exports: [AuditService],
})
export class AuditModule {}
