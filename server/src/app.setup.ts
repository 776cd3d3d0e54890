import { RequestMethod } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import { json } from 'express';
import { ApiExceptionFilter } from './common/api-exception.filter.js';
import { jsonBodyOptions } from './common/json-body.js';
import { createValidationPipe } from './common/validation.js';
import { ConfigService } from './config/config.service.js';
import { routeReads } from './database/replica-reads.js';
import { buildApiDocument } from './openapi/api-document.js';
import { MEDIA_FILES_PATH } from './media/media-files.controller.js';
import { answerManifestPollsFirst } from './kiosks/manifest-poll.js';
import { MEDIA_STORE, type MediaStore } from './media/media-store.js';
import { releaseFileKey } from './releases/release-file-store.js';
import { answerUnknownPaths, serveApps } from './static/serve-apps.js';
import { securityHeaders, writeSecurityHeaders, type SecurityHeaders } from './static/security-headers.js';

/** Configures and initialises the app the same way for the running server and for the tests. */
export async function initApp(app: NestExpressApplication): Promise<void> {
  const headers = configureApp(app, await presignedFileOrigin(app));
  await app.init();
  answerManifestPollsFirst(app, headers);
  answerUnknownPaths(app);
}

/** Where kiosks are sent for release files: the origin of the store's presigned URLs, when it gives them. */
async function presignedFileOrigin(app: NestExpressApplication): Promise<string | null> {
  const seconds = app.get(ConfigService).presignedUrlSeconds;
  const url = seconds > 0 ? await app.get<MediaStore>(MEDIA_STORE).presignedUrl(releaseFileKey('0'.repeat(64)), { contentType: 'application/octet-stream', expiresInS: seconds }) : null;
  return url ? new URL(url).origin : null;
}

/** Everything around the modules, before Nest mounts its routes; gives back the security headers every answer carries. */
function configureApp(app: NestExpressApplication, fileOrigin: string | null): SecurityHeaders {
  const config = app.get(ConfigService);
  app.set('trust proxy', config.trustProxy);
  app.disable('x-powered-by');
  // First, so that every answer carries them: pages, assets, API responses and errors alike.
  const headers = securityHeaders({ https: config.overHttps, fileOrigin });
  app.use(writeSecurityHeaders(headers));
  app.setGlobalPrefix('api', { exclude: [{ path: MEDIA_FILES_PATH, method: RequestMethod.GET }] });
  app.use(cookieParser());
  if (config.databaseReplicaUrls.length > 0) app.use(routeReads({ lagAllowanceSeconds: config.replicaLagAllowanceSeconds, secure: config.secureCookies }));
  // Express names this parser jsonParser, so Nest sees one applied and adds none of its own.
  app.use(json(jsonBodyOptions));
  app.useGlobalPipes(createValidationPipe());
  app.useGlobalFilters(new ApiExceptionFilter());

  SwaggerModule.setup('api/docs', app, () => buildApiDocument(app));

  serveApps(app, [
    { prefix: '/', dir: config.studioDist },
    { prefix: '/kiosk/', dir: config.kioskDist },
  ]);
  return headers;
}
