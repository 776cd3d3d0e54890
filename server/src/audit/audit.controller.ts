import { Controller, Get, Query, Req, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { Roles } from '../auth/auth.decorators.js';
import { AuditService } from './audit.service.js';
import { ListAuditEventsQuery } from './dto/list-audit-events.query.js';

/** Read-only on purpose: the audit trail has no update or delete route. */
@ApiTags('audit')
@ApiBearerAuth()
@Controller('audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  /** A page of JSON, or with `Accept: text/csv` every matching event as a file. */
  @Get()
  @Roles('admin')
  @ApiProduces('application/json', 'text/csv')
  list(@Query() query: ListAuditEventsQuery, @Req() request: Request, @Res({ passthrough: true }) response: Response) {
    if (request.accepts(['application/json', 'text/csv']) !== 'text/csv') return this.audit.list(query);
    response.attachment('audit-trail.csv').type('text/csv; charset=utf-8');
    return this.audit.exportCsv(query);
  }
}
