import fs from 'node:fs';
import path from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import express, { type NextFunction, type Request, type Response } from 'express';
import { IMMUTABLE } from '../media/stored-file-response.js';

/** Vite names built assets after their content, so a name never changes meaning. */
const HASHED_ASSET = /[.-][A-Za-z0-9_-]{8,}\.(js|css|woff2?|png|jpe?g|svg|webp|avif|wasm|map)$/;
const REVALIDATE = 'no-cache';

const isApi = (req: Request) => req.originalUrl === '/api' || req.originalUrl.startsWith('/api/') || req.originalUrl.startsWith('/api?');

interface SinglePageApp {
  /** URL prefix, ending in a slash. */
  prefix: string;
  dir: string | undefined;
}

/**
 * Serves the built studio at `/` and kiosk at `/kiosk/`, each falling back to its index.html for
 * page URLs so client-side routes survive a reload. An app whose build folder is missing is skipped.
 */
export function serveApps(app: NestExpressApplication, apps: SinglePageApp[]): void {
  const present = apps
    .filter((spa): spa is SinglePageApp & { dir: string } => !!spa.dir && fs.existsSync(path.join(spa.dir, 'index.html')))
    // Longest prefix first, so /kiosk/... is not taken by the studio at /.
    .sort((a, b) => b.prefix.length - a.prefix.length);

  for (const spa of present) {
    if (spa.prefix !== '/') {
      const bare = spa.prefix.slice(0, -1);
      app.use(bare, (req: Request, res: Response, next: NextFunction) =>
        req.originalUrl === bare ? res.redirect(301, spa.prefix) : next());
    }
    const files = express.static(spa.dir, {
      index: false,
      setHeaders: (res, file) => res.setHeader('Cache-Control', HASHED_ASSET.test(file) ? IMMUTABLE : REVALIDATE),
    });
    // The studio sits at /, so without this every API request (a kiosk's poll too) would cost a
    // look in its build folder first.
    app.use(spa.prefix, (req: Request, res: Response, next: NextFunction) => {
      if (isApi(req)) next();
      else files(req, res, next);
    });
  }

  app.use((req: Request, res: Response, next: NextFunction) => {
    if (isApi(req)) return next();
    const isPage = (req.method === 'GET' || req.method === 'HEAD') && !path.posix.basename(req.path).includes('.');
    const spa = isPage ? present.find((candidate) => req.path.startsWith(candidate.prefix)) : undefined;
    if (!spa) return next();
    res.setHeader('Cache-Control', REVALIDATE);
    res.sendFile(path.join(spa.dir, 'index.html'));
  });
}

/**
 * Nest answers unknown paths under /api itself; this answers the rest (a missing file, say) in the
 * same JSON shape. Registered after `init()`, so that routes Nest mounts outside /api come first.
 */
export function answerUnknownPaths(app: NestExpressApplication): void {
  app.use((req: Request, res: Response) => {
    res.status(404).json({ statusCode: 404, message: `Nothing is served at ${req.path}.` });
  });
}
