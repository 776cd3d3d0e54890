import { z } from 'zod';

/**
 * Zod probes whether it may compile parsers with `new Function` the first time an object schema is
 * built. The studio and the kiosk run under a Content-Security-Policy without 'unsafe-eval', where
 * that probe, though caught, is reported as a violation; jitless parsing never makes it. Each app
 * imports this module before anything else, so it runs before the first schema is built.
 */
z.config({ jitless: true });
