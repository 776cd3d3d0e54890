import { z } from 'zod';

/**
 * The one `z` every schema in shared is built with. Zod probes whether it may compile parsers with
 * `new Function`; the studio and the kiosk run under a Content-Security-Policy without
 * 'unsafe-eval', where that probe, though caught, is reported as a violation. A schema takes the
 * setting when it is built, so it is set here, in the module every schema module imports, and no
 * bundler's chunk order can put a schema before it.
 */
z.config({ jitless: true });

export { z };
