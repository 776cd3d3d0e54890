import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Roles } from '../auth/auth.decorators.js';
import { AuditService } from './audit.service.js';
import { ListAuditEventsQuery } from './dto/list-audit-events.query.js';

/** Read-only on purpose: the audit trail has no update or delete route. */
@ApiTags('audit')
@ApiBearerAuth()
@Controller('audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  @Roles('admin')
  list(@Query() query: ListAuditEventsQuery) {
    return this.audit.list(query);
  }
}
