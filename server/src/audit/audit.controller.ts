import { Controller, Get, Query, Req, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { AUDIT_READERS, AuditService } from './audit.service.js';
import { ListAuditEventsQuery } from './dto/list-audit-events.query.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

/** Read-only on purpose: the audit trail has no update or delete route. */
@ApiTags('audit')
@ApiBearerAuth()
@Controller('audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  /** A page of JSON, or with `Accept: text/csv` every matching event as a file. */
  @ApiAnswer('AuditEventPage', { alsoAs: 'text/csv' })
  @Get()
  @Roles(...AUDIT_READERS)
  @ApiProduces('application/json', 'text/csv')
  list(@Query() query: ListAuditEventsQuery, @CurrentUser() person: User, @Req() request: Request, @Res({ passthrough: true }) response: Response) {
    if (request.accepts(['application/json', 'text/csv']) !== 'text/csv') return this.audit.list(query, person);
    response.attachment('audit-trail.csv').type('text/csv; charset=utf-8');
    return this.audit.exportCsv(query, person);
  }
}
