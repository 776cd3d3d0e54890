import { Controller, Get, HttpStatus, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Public } from '../auth/auth.decorators.js';
import { DATABASE_RETRY_AFTER_SECONDS } from '../database/database-unavailable.js';
import { HealthService, type Health } from './health.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

/** For load balancers and `npm start`: 503 takes an instance out of rotation while its database is gone. */
@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(private readonly health: HealthService) {}

  @Public()
  @ApiAnswer('Health')
  @ApiAnswer('Health', { status: HttpStatus.SERVICE_UNAVAILABLE, description: 'The database does not answer.' })
  @Get()
  async check(@Res({ passthrough: true }) res: Response): Promise<Health> {
    const health = await this.health.check();
    if (health.status !== 'ok') res.status(HttpStatus.SERVICE_UNAVAILABLE).set('Retry-After', String(DATABASE_RETRY_AFTER_SECONDS));
    return health;
  }
}
