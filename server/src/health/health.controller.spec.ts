import request from 'supertest';
import type { Response } from 'express';
import type { Sequelize } from 'sequelize-typescript';
import { describe, expect, it } from 'vitest';
import { createTestApp } from '../../test/test-app.js';
import { HealthController } from './health.controller.js';
import { HealthService } from './health.service.js';

describe('GET /api/health', () => {
  it('answers 200 {status: ok, db: up} while the database answers', async () => {
    const t = await createTestApp();
    try {
      const res = await request(t.http).get('/api/health');
      expect(res.status).toBe(200);
      expect(res.body).toEqual({ status: 'ok', db: 'up' });
    } finally {
      await t.close();
    }
  });

  it('answers 503 {status: error, db: down} when the database does not', async () => {
    // A stopped MariaDB cannot be had inside one suite; a connection that refuses stands in for it.
    const unreachable = { query: () => Promise.reject(new Error('connect ECONNREFUSED 127.0.0.1:3306')) } as unknown as Sequelize;
    let status = 200;
    const res = { status: (code: number) => { status = code; return res; } } as unknown as Response;
    const body = await new HealthController(new HealthService(unreachable)).check(res);
    expect({ status, body }).toEqual({ status: 503, body: { status: 'error', db: 'down' } });
  });
});
