import { Injectable } from '@nestjs/common';
import { Sequelize } from 'sequelize-typescript';

export type Health = { status: 'ok'; db: 'up' } | { status: 'error'; db: 'down' };

@Injectable()
export class HealthService {
  constructor(private readonly sequelize: Sequelize) {}

  async check(): Promise<Health> {
    try {
      await this.sequelize.query('SELECT 1');
      return { status: 'ok', db: 'up' };
    } catch {
      return { status: 'error', db: 'down' };
    }
  }
}
