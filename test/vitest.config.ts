import { defineConfig } from 'vitest/config';

// Whole-system tests against the stack `npm test` started (a real browser, one file at a time), the
// scale test (its own two instances behind nginx on the replicated MariaDB pair), and
// checks that the contributor guide matches what the code enforces.
export default defineConfig({
  test: {
    include: ['browser/**/*.test.ts', 'docs/**/*.test.ts', 'scale/**/*.test.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 60_000,
  },
});
