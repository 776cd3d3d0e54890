import { Injectable } from '@nestjs/common';
import { Sequelize } from 'sequelize-typescript';
import { ConfigService } from '../config/config.service.js';

export type Health = { status: 'ok'; db: 'up' } | { status: 'error'; db: 'down' };

@Injectable()
export class HealthService {
  constructor(
    private readonly sequelize: Sequelize,
    private readonly config: ConfigService,
  ) {}

  /**
   * Down when the database fails or does not answer within HEALTH_DB_TIMEOUT_MS: a load balancer's
   * probe must get its answer quickly, whatever the database is doing. A stalled ping keeps its
   * connection until the statement limit closes it.
   */
  async check(): Promise<Health> {
    let timer: NodeJS.Timeout | undefined;
    const late = new Promise<false>((resolve) => (timer = setTimeout(() => resolve(false), this.config.healthDbTimeoutMs)));
    const answered = this.sequelize.query('SELECT 1').then(() => true, () => false);
    try {
      return (await Promise.race([answered, late])) ? { status: 'ok', db: 'up' } : { status: 'error', db: 'down' };
    } finally {
      clearTimeout(timer);
    }
  }
}
