import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../../test/test-app.js';

function builtApp(title: string, asset: string): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'mp-spa-'));
  fs.mkdirSync(path.join(dir, 'assets'));
  fs.writeFileSync(path.join(dir, 'index.html'), `<!doctype html><title>${title}</title>`);
  fs.writeFileSync(path.join(dir, 'assets', asset), 'export {};');
  return dir;
}

const studio = builtApp('studio', 'index-BfK3x9_a.js');
const kiosk = builtApp('kiosk', 'main-Qz81LmN0.js');
const t = await createTestApp({ env: { STUDIO_DIST: studio, KIOSK_DIST: kiosk } });
afterAll(async () => {
  await t.close();
  for (const dir of [studio, kiosk]) fs.rmSync(dir, { recursive: true, force: true });
});

describe('serving the studio and the kiosk', () => {
  it('serves the studio at / and its index.html for page URLs, never cached without revalidation', async () => {
    for (const url of ['/', '/people', '/invitation/abc_DEF-123']) {
      const res = await request(t.http).get(url);
      expect(res.status).toBe(200);
      expect(res.text).toContain('<title>studio</title>');
      expect(res.headers['cache-control']).toBe('no-cache');
    }
  });

  it('serves the kiosk at /kiosk/ with its own fallback, and sends /kiosk there', async () => {
    const redirect = await request(t.http).get('/kiosk');
    expect(redirect.status).toBe(301);
    expect(redirect.headers.location).toBe('/kiosk/');
    for (const url of ['/kiosk/', '/kiosk/attract']) expect((await request(t.http).get(url)).text).toContain('<title>kiosk</title>');
  });

  it('lets browsers keep hashed assets for a year', async () => {
    const res = await request(t.http).get('/kiosk/assets/main-Qz81LmN0.js');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect((await request(t.http).get('/assets/index-BfK3x9_a.js')).headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('answers a missing file and an unknown API route with JSON 404s, not the page', async () => {
    for (const url of ['/assets/gone-AAAAAAAA.js', '/api/nothing-here']) {
      const res = await request(t.http).get(url);
      expect(res.status).toBe(404);
      expect(res.body.statusCode).toBe(404);
    }
  });
});
