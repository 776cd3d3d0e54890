import type { NextFunction, Request, Response } from 'express';
import helmet, { type HelmetOptions } from 'helmet';

type Directives = NonNullable<Exclude<HelmetOptions['contentSecurityPolicy'], boolean | undefined>['directives']>;

/**
 * What the studio, the kiosk and the API reference at /api/docs need, and no more. No script runs
 * unless it is one of our built files (no inline script, no eval). Styles may be inline: Fluent
 * UI's Griffel and Tiptap insert style elements at run time, and Swagger UI's page carries its own.
 * The convection solver's Web Worker and the kiosk's service worker are built files too; images
 * may be data: or blob: URLs (icons; the kiosk shows release images from IndexedDB); fonts ship
 * with the apps. Nobody may frame a page (clickjacking).
 */
const directives: Directives = {
  'default-src': ["'self'"],
  'base-uri': ["'self'"],
  'script-src': ["'self'"],
  'script-src-attr': ["'none'"],
  'style-src': ["'self'", "'unsafe-inline'"],
  'img-src': ["'self'", 'data:', 'blob:'],
  'font-src': ["'self'"],
  'connect-src': ["'self'"],
  'worker-src': ["'self'"],
  'manifest-src': ["'self'"],
  'object-src': ["'none'"],
  'form-action': ["'self'"],
  'frame-ancestors': ["'none'"],
};

/**
 * Browser features no screen of ours uses are switched off for every page; the kiosk may ask for
 * fullscreen. Helmet does not set this header.
 */
const PERMISSIONS_POLICY = [
  'fullscreen=(self)',
  ...['accelerometer', 'bluetooth', 'browsing-topics', 'camera', 'display-capture', 'geolocation', 'gyroscope', 'hid', 'magnetometer',
    'microphone', 'midi', 'payment', 'publickey-credentials-get', 'serial', 'usb', 'xr-spatial-tracking'].map((feature) => `${feature}=()`),
].join(', ');

/** The security headers and their values, the same for every response. */
export type SecurityHeaders = ReadonlyMap<string, string>;

/**
 * Security headers for every response (pages, assets, API answers and errors alike), through helmet
 * with our policy. Over HTTPS, browsers are also told to keep to it (HSTS, upgrade-insecure-requests);
 * over plain HTTP on a venue's own network those would only break the page.
 *
 * Our policy asks helmet for nothing that depends on the request (no nonce), so its headers are
 * taken down once, at start-up, and written as they are: the manifest poll, answered before Express,
 * writes the same set without running helmet per poll.
 */
export function securityHeaders(options: { https: boolean; fileOrigin: string | null }): SecurityHeaders {
  // A kiosk sent to a presigned URL of the bucket fetches from the bucket's origin.
  const connectSrc = options.fileOrigin ? ["'self'", options.fileOrigin] : ["'self'"];
  const helmetHeaders = helmet({
    contentSecurityPolicy: { useDefaults: false, directives: { ...directives, 'connect-src': connectSrc, 'upgrade-insecure-requests': options.https ? [] : null } },
    strictTransportSecurity: options.https ? { maxAge: 31_536_000 } : false,
    xFrameOptions: { action: 'deny' },
    referrerPolicy: { policy: 'no-referrer' },
  });
  const values = new Map<string, string>([['Permissions-Policy', PERMISSIONS_POLICY]]);
  const recorder = {
    setHeader: (name: string, value: string | number | readonly string[]) => values.set(name, String(value)),
    removeHeader: (name: string) => values.delete(name),
  };
  let taken = false;
  // Helmet's middleware only sets and removes response headers, and calls next at once.
  helmetHeaders({} as Request, recorder as unknown as Response, (error?: unknown) => {
    if (error) throw error instanceof Error ? error : new Error('Helmet refused its options', { cause: error });
    taken = true;
  });
  if (!taken) throw new Error('Helmet did not finish at once; its headers cannot be taken down at start-up.');
  return values;
}

/** The middleware that writes the security headers on every response, first of all. */
export function writeSecurityHeaders(headers: SecurityHeaders): (req: Request, res: Response, next: NextFunction) => void {
  return (_req, res, next) => {
    for (const [name, value] of headers) res.setHeader(name, value);
    next();
  };
}
