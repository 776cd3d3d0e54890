import { readFileSync } from 'node:fs';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { kioskServiceWorker } from './build/service-worker-plugin.ts';

const BASE = '/kiosk/';
const { version } = JSON.parse(readFileSync(new URL('./package.json', import.meta.url), 'utf8')) as { version: string };

export default defineConfig(({ command }) => {
  // `npm test` runs every build with NODE_ENV=test, which would ship React's development build;
  // what the server serves is always a production build.
  if (command === 'build') process.env.NODE_ENV = 'production';
  return {
    // The server serves the kiosk under /kiosk/, next to the studio at /.
    base: BASE,
    plugins: [react(), kioskServiceWorker(BASE)],
    define: { __KIOSK_VERSION__: JSON.stringify(version) },
    server: {
      port: 5174,
      proxy: { '/api': 'http://127.0.0.1:4310' },
    },
    build: { target: 'es2022' },
  };
});
