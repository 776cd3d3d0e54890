import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import express from 'express';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../../test/test-app.js';
import { securityHeaders, writeSecurityHeaders } from './security-headers.js';

const studio = fs.mkdtempSync(path.join(os.tmpdir(), 'mp-headers-'));
fs.writeFileSync(path.join(studio, 'index.html'), '<!doctype html><title>studio</title>');
const t = await createTestApp({ env: { STUDIO_DIST: studio } });
afterAll(async () => {
  await t.close();
  fs.rmSync(studio, { recursive: true, force: true });
});

/** The policy as a map of directive → sources, so a test reads one directive at a time. */
function policyOf(res: request.Response): Record<string, string[]> {
  const header = res.headers['content-security-policy'] as string | undefined;
  expect(header, `a Content-Security-Policy header on ${(res as unknown as { req: { path: string } }).req.path}`).toBeTruthy();
  return Object.fromEntries(header!.split(';').map((d) => d.trim().split(/\s+/)).map(([name, ...sources]) => [name, sources]));
}

describe('security headers', () => {
  it('sends the apps\' policy, framing refused, on a page, an API answer and an error alike', async () => {
    const answers = [
      await request(t.http).get('/stories'),
      await request(t.http).get('/api/health'),
      await request(t.http).get('/api/auth/me'),
      await request(t.http).get('/assets/missing-AAAAAAAA.js'),
    ];
    expect(answers.map((res) => res.status)).toEqual([200, 200, 401, 404]);
    for (const res of answers) {
      const policy = policyOf(res);
      expect({
        'default-src': policy['default-src'],
        'script-src': policy['script-src'],
        'object-src': policy['object-src'],
        'frame-ancestors': policy['frame-ancestors'],
        'worker-src': policy['worker-src'],
      }).toEqual({
        'default-src': ["'self'"],
        'script-src': ["'self'"],
        'object-src': ["'none'"],
        'frame-ancestors': ["'none'"],
        'worker-src': ["'self'"],
      });
      expect(res.headers['x-frame-options']).toBe('DENY');
      expect(res.headers['referrer-policy']).toBe('no-referrer');
      expect(res.headers['x-content-type-options']).toBe('nosniff');
      expect(res.headers['permissions-policy']).toMatch(/(^|, )camera=\(\)(,|$)/);
      expect(res.headers['permissions-policy']).toMatch(/(^|, )fullscreen=\(self\)(,|$)/);
      expect(res.headers['x-powered-by']).toBeUndefined();
    }
  });

  it('never allows inline or evaluated script, on any page', async () => {
    const scripts = policyOf(await request(t.http).get('/'))['script-src'];
    expect(scripts.filter((source) => source.startsWith("'unsafe") || source.startsWith("'nonce") || source === 'data:')).toEqual([]);
  });

  it('tells a browser nothing about HTTPS on a plain-HTTP address (HSTS there would only strand it)', async () => {
    const res = await request(t.http).get('/api/health');
    expect(res.headers['strict-transport-security']).toBeUndefined();
    expect(policyOf(res)['upgrade-insecure-requests']).toBeUndefined();
  });

  it('keeps browsers on HTTPS once people reach the server over it', async () => {
    const res = await request(express().use(writeSecurityHeaders(securityHeaders({ https: true, fileOrigin: null }))).get('/', (_req, reply) => reply.send('ok'))).get('/');
    expect(res.headers['strict-transport-security']).toBe('max-age=31536000; includeSubDomains');
    expect(policyOf(res)['upgrade-insecure-requests']).toEqual([]);
  });
});
