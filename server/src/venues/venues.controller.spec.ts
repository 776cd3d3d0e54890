import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../../test/test-app.js';
import { Venue } from './models/venue.model.js';

const t = await createTestApp();
afterAll(() => t.close());

describe('GET /api/kiosk/venue', () => {
  it('shows the first venue’s name and languages, source first, without signing in', async () => {
    const venues = t.app.get<typeof Venue>(getModelToken(Venue));
    const first = (await venues.findOne({ order: [['id', 'ASC']] }))
      ?? (await venues.create({ name: 'Obsidian Bay Geology Hall', slug: 'obsidian-bay', sourceLocale: 'en', targetLocales: ['fr', 'pt-BR'] }));
    const res = await request(t.http).get('/api/kiosk/venue');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ name: first.name, locales: [first.sourceLocale, ...first.targetLocales] });
  });
});
