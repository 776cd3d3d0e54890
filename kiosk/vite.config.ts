import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

export default defineConfig(({ command }) => {
  // `npm test` runs every build with NODE_ENV=test, which would ship React's development build;
  // what the server serves is always a production build.
  if (command === 'build') process.env.NODE_ENV = 'production';
  return {
    // The server serves the kiosk under /kiosk/, next to the studio at /.
    base: '/kiosk/',
    plugins: [react()],
    server: {
      port: 5174,
      proxy: { '/api': 'http://127.0.0.1:4310' },
    },
    build: { target: 'es2022' },
  };
});
