import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

export default defineConfig(({ command }) => ({
  // The server serves the kiosk under /kiosk/, next to the studio at /.
  base: '/kiosk/',
  plugins: [react()],
  // `npm test` builds with NODE_ENV=test; the kiosk always ships React's production build.
  define: command === 'build' ? { 'process.env.NODE_ENV': JSON.stringify('production') } : {},
  server: {
    port: 5174,
    proxy: { '/api': 'http://127.0.0.1:4310' },
  },
  build: { target: 'es2022' },
}));
