import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import type { Plugin } from 'vite';

/**
 * Emits sw.js with the list of every built file. Hand-written rather than vite-plugin-pwa: that
 * plugin brings workbox-build (rollup, babel, terser and dozens more packages) to produce what is
 * here a cache of one fixed file list and a page fallback, and it would be one more toolchain to
 * keep in step with Vite 8's bundler.
 */
export function kioskServiceWorker(base: string): Plugin {
  return {
    name: 'mantlepiece-kiosk-service-worker',
    apply: 'build',
    enforce: 'post',
    generateBundle(_options, bundle) {
      const files = Object.keys(bundle).filter((name) => !name.endsWith('.map')).sort();
      const precache = files.map((name) => `${base}${name}`);
      const version = createHash('sha256').update(files.join('\n')).digest('hex').slice(0, 16);
      const template = readFileSync(new URL('./service-worker.js', import.meta.url), 'utf8');
      const source = template
        .replace('self.__KIOSK_PRECACHE__', JSON.stringify(precache))
        .replace('self.__KIOSK_VERSION__', JSON.stringify(version));
      this.emitFile({ type: 'asset', fileName: 'sw.js', source });
    },
  };
}
