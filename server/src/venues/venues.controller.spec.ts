import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { signedInAs } from '../../test/authoring-fixtures.js';
import { createTestApp } from '../../test/test-app.js';

const t = await createTestApp();
afterAll(() => t.close());

async function newVenue(admin: Record<string, string>, label: string) {
  const slug = `${label}-${Math.random().toString(36).slice(2, 8)}`;
  const res = await request(t.http).post('/api/venues').set(admin).send({ name: `${label} hall`, slug, sourceLocale: 'en', targetLocales: ['fr', 'pt-BR'] });
  expect(res.status).toBe(201);
  return res.body as { id: number; slug: string; name: string };
}

describe('GET /api/kiosk/venue (unpaired)', () => {
  it('shows the venue the install URL names, source language first, without signing in', async () => {
    const admin = await signedInAs(t, 'admin');
    const venue = await newVenue(admin, 'obsidian-bay');
    const res = await request(t.http).get(`/api/kiosk/venue?slug=${venue.slug}`);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ name: venue.name, locales: ['en', 'fr', 'pt-BR'] });
  });

  it('answers 204 when several venues exist and none is named, and 404 for a key no venue has', async () => {
    const admin = await signedInAs(t, 'admin');
    await newVenue(admin, 'first');
    await newVenue(admin, 'second');
    const unnamed = await request(t.http).get('/api/kiosk/venue');
    expect(unnamed.status).toBe(204);
    expect(unnamed.text).toBe('');
    const unknown = await request(t.http).get('/api/kiosk/venue?slug=no-such-venue-here');
    expect(unknown.status).toBe(404);
    expect(unknown.body).toEqual({ statusCode: 404, message: 'There is no such venue.' });
  });

  it('refuses a key that is not one, naming the field', async () => {
    const res = await request(t.http).get('/api/kiosk/venue?slug=Not%20A%20Key');
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ path: ['slug'], message: expect.stringMatching(/lower-case/) }]);
  });
});
