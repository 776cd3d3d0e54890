import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

export default defineConfig(({ command }) => {
  // `npm test` runs every build with NODE_ENV=test, which would ship React's development build;
  // what the server serves is always a production build.
  if (command === 'build') process.env.NODE_ENV = 'production';
  return {
    plugins: [react()],
    server: {
      // `npm start` serves the API on 4310; `vite` dev mode forwards to it so cookies stay same-origin.
      proxy: { '/api': 'http://127.0.0.1:4310' },
    },
    build: { target: 'es2022' },
  };
});
