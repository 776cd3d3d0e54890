import type { IncomingMessage, OutgoingHttpHeaders, RequestListener, Server, ServerResponse } from 'node:http';
import type { NestExpressApplication } from '@nestjs/platform-express';
import type { SecurityHeaders } from '../static/security-headers.js';
import { credentialOf } from './device-token.js';
import { KioskReleasesService, type LiveManifest } from './kiosk-releases.service.js';
import { PairedKioskReader } from './paired-kiosk-reader.js';

const MANIFEST_POLL = '/api/kiosk/manifest';

/**
 * The answer to a manifest poll. Revalidated by ETag: a kiosk polling an unchanged publication gets
 * 304 and no body. A gallery with nothing published answers 204: an expected state a kiosk polls
 * through, not an error.
 */
export function answerManifestPoll(res: ServerResponse, live: LiveManifest | null, ifNoneMatch: string | undefined, headers: OutgoingHttpHeaders = {}): void {
  if (!live) {
    res.writeHead(204, { ...headers, 'Cache-Control': 'no-cache' }).end();
    return;
  }
  const { etag, body } = live;
  if (ifNoneMatch?.split(',').some((tag) => tag.trim() === etag)) {
    res.writeHead(304, { ...headers, ETag: etag, 'Cache-Control': 'no-cache' }).end();
    return;
  }
  res.writeHead(200, { ...headers, ETag: etag, 'Cache-Control': 'no-cache', 'Content-Type': 'application/json; charset=utf-8', 'Content-Length': String(body.length) }).end(body);
}

/**
 * Kiosks poll the manifest all day, thousands of them on a venue network, so a paired kiosk's poll
 * is answered on node's own request event, before Express and Nest: the same reading of its
 * credential and the same paired-kiosk read as the device-token guard, the gallery's kept signed
 * answer, the security headers every response carries (taken down once at start-up), and 200, 304
 * or 204. The KioskController route (GET /api/kiosk/manifest) answers everything else with the
 * API's errors: no token, a person's token, an unknown or revoked kiosk, and a poll whose read failed.
 */
export function answerManifestPollsFirst(app: NestExpressApplication, securityHeaders: SecurityHeaders): void {
  const server = app.getHttpServer() as Server;
  const [nest] = server.listeners('request') as RequestListener[];
  if (!nest) throw new Error('The HTTP server has no request listener to put the manifest poll in front of.');
  const pairedKiosks = app.get(PairedKioskReader);
  const releases = app.get(KioskReleasesService);
  const headers: OutgoingHttpHeaders = Object.fromEntries(securityHeaders);

  async function answered(req: IncomingMessage, res: ServerResponse, token: string): Promise<boolean> {
    const kiosk = await pairedKiosks.read(token);
    if (!kiosk) return false;
    answerManifestPoll(res, await releases.liveManifest(kiosk), req.headers['if-none-match'], headers);
    return true;
  }

  server.removeListener('request', nest);
  server.on('request', (req: IncomingMessage, res: ServerResponse) => {
    const credential = req.method === 'GET' && req.url === MANIFEST_POLL ? credentialOf(req.headers.authorization) : null;
    if (credential?.kind !== 'device') {
      nest(req, res);
      return;
    }
    answered(req, res, credential.token).then(
      (done) => done || nest(req, res),
      // Nothing is written before the answer is whole, so a failed read leaves the poll to the route and its error.
      () => nest(req, res),
    );
  });
}
