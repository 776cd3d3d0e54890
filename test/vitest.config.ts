import { defineConfig } from 'vitest/config';

// Whole-system tests against the stack `npm test` started: a real browser, one file at a time.
export default defineConfig({
  test: {
    include: ['browser/**/*.test.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 60_000,
  },
});
