import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

export default defineConfig(({ command }) => ({
  plugins: [react()],
  // `npm test` runs the build with NODE_ENV=test; the bundle the server ships is always React's
  // production build all the same.
  define: command === 'build' ? { 'process.env.NODE_ENV': JSON.stringify('production') } : {},
  server: {
    // `npm start` serves the API on 4310; `vite` dev mode forwards to it so cookies stay same-origin.
    proxy: { '/api': 'http://127.0.0.1:4310' },
  },
  build: { target: 'es2022' },
}));
