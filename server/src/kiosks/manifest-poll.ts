import type { IncomingMessage, RequestListener, Server, ServerResponse } from 'node:http';
import type { NestExpressApplication } from '@nestjs/platform-express';
import type { Request, Response } from 'express';
import { hashToken } from '../common/tokens.js';
import type { securityHeaders as makeSecurityHeaders } from '../static/security-headers.js';
import { bearerOf, isDeviceToken } from './device-token.js';
import { KioskReleasesService, type LiveManifest } from './kiosk-releases.service.js';
import { PairedKioskReader } from './paired-kiosk-reader.js';

const MANIFEST_POLL = '/api/kiosk/manifest';

/**
 * The answer to a manifest poll. Revalidated by ETag: a kiosk polling an unchanged publication gets
 * 304 and no body. A gallery with nothing published answers 204: an expected state a kiosk polls
 * through, not an error.
 */
export function answerManifestPoll(res: ServerResponse, live: LiveManifest | null, ifNoneMatch: string | undefined): void {
  if (!live) {
    res.writeHead(204, { 'Cache-Control': 'no-cache' }).end();
    return;
  }
  const { etag, body } = live;
  if (ifNoneMatch?.split(',').some((tag) => tag.trim() === etag)) {
    res.writeHead(304, { ETag: etag, 'Cache-Control': 'no-cache' }).end();
    return;
  }
  res.writeHead(200, { ETag: etag, 'Cache-Control': 'no-cache', 'Content-Type': 'application/json; charset=utf-8', 'Content-Length': String(body.length) }).end(body);
}

/**
 * Kiosks poll the manifest all day, thousands of them on a venue network, so a paired kiosk's poll
 * is answered on node's own request event, before Express and Nest: the device token read (shared
 * with the polls that arrive meanwhile), the gallery's kept signed answer, the security headers
 * every response carries, and 200, 304 or 204. It is the same check and the same answer as the
 * KioskController route (GET /api/kiosk/manifest), which answers everything else: no token, a
 * person's token, an unknown or revoked kiosk, and a poll whose read failed (with the API's errors).
 */
export function answerManifestPollsFirst(app: NestExpressApplication, securityHeaders: ReturnType<typeof makeSecurityHeaders>): void {
  const server = app.getHttpServer() as Server;
  const [nest] = server.listeners('request') as RequestListener[];
  if (!nest) throw new Error('The HTTP server has no request listener to put the manifest poll in front of.');
  const pairedKiosks = app.get(PairedKioskReader);
  const releases = app.get(KioskReleasesService);

  async function answered(req: IncomingMessage, res: ServerResponse, token: string): Promise<boolean> {
    const kiosk = await pairedKiosks.read(hashToken(token));
    if (!kiosk) return false;
    const live = await releases.liveManifest(kiosk);
    // Helmet and our policy header use node's own response methods only, none of Express's.
    await new Promise<void>((resolve, reject) => securityHeaders(req as Request, res as Response, (error?: unknown) => (error ? reject(error instanceof Error ? error : new Error('Security headers could not be set', { cause: error })) : resolve())));
    answerManifestPoll(res, live, req.headers['if-none-match']);
    return true;
  }

  server.removeListener('request', nest);
  server.on('request', (req: IncomingMessage, res: ServerResponse) => {
    const token = req.method === 'GET' && req.url === MANIFEST_POLL ? bearerOf(req.headers.authorization) : null;
    if (token === null || !isDeviceToken(token)) {
      nest(req, res);
      return;
    }
    answered(req, res, token).then(
      (done) => done || nest(req, res),
      () => nest(req, res),
    );
  });
}
