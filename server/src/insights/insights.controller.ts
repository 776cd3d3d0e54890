import { Controller, Get, Query, Req, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { InsightsQuery } from './dto/insights.query.js';
import { toInsightsCsv } from './insights.presenter.js';
import { INSIGHTS_READERS, InsightsService } from './insights.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

@ApiTags('insights')
@ApiBearerAuth()
@Controller('insights')
export class InsightsController {
  constructor(private readonly insights: InsightsService) {}

  /** The figures as JSON, or with `Accept: text/csv` the same figures as a file. */
  @ApiAnswer('InsightsView', { alsoAs: 'text/csv' })
  @Get()
  @Roles(...INSIGHTS_READERS)
  @ApiProduces('application/json', 'text/csv')
  async figures(@Query() query: InsightsQuery, @CurrentUser() person: User, @Req() request: Request, @Res({ passthrough: true }) response: Response) {
    const view = await this.insights.figures(query, person);
    if (request.accepts(['application/json', 'text/csv']) !== 'text/csv') return view;
    response.attachment(`insights-gallery-${view.galleryId}-${view.from}_to_${view.to}.csv`).type('text/csv; charset=utf-8');
    return toInsightsCsv(view);
  }
}
