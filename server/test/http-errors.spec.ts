import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createTestApp } from './test-app.js';

const t = await createTestApp();
afterAll(() => t.close());

describe('error bodies', () => {
  it('answers malformed JSON with 400 and a plain message', async () => {
    const res = await request(t.http).post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": "a@b.c",');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ statusCode: 400, message: 'The request body is not valid JSON.' });
  });

  it('answers an unknown API route with a JSON 404, whatever the method', async () => {
    for (const res of [await request(t.http).get('/api/no-such-thing'), await request(t.http).delete('/api/auth/me')]) {
      expect(res.status).toBe(404);
      expect(res.headers['content-type']).toMatch(/application\/json/);
      expect(res.body).toEqual({ statusCode: 404, message: expect.any(String) });
    }
  });

  it('names each invalid or unexpected field of a body in `errors`', async () => {
    const res = await request(t.http).post('/api/auth/password-reset').send({ email: 'not an address', extra: true });
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      statusCode: 400,
      message: 'Some fields are not valid.',
      errors: expect.arrayContaining([
        { path: ['email'], message: 'Enter a valid e-mail address.' },
        { path: ['extra'], message: 'property extra should not exist' },
      ]),
    });
  });

  it('answers a body over the size limit with 413 and no details of the parser', async () => {
    const res = await request(t.http).post('/api/auth/login').set('Content-Type', 'application/json')
      .send(JSON.stringify({ email: 'x'.repeat(200_000), password: 'y' }));
    expect(res.status).toBe(413);
    expect(res.body).toEqual({ statusCode: 413, message: 'The request body is too large.' });
  });
});
