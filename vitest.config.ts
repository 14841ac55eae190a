import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    projects: [
      { test: { name: 'unit', include: ['tests/shared/**/*.test.ts'] } },
      {
        test: {
          name: 'api',
          include: ['tests/server/**/*.test.ts'],
          setupFiles: ['tests/setup/fail-on-console-error.ts'],
          testTimeout: 30_000,
          hookTimeout: 30_000,
        },
      },
      {
        test: {
          name: 'browser',
          include: ['tests/e2e/**/*.test.ts'],
          // The server runs in the test process: an error it logs fails the test.
          setupFiles: ['tests/setup/fail-on-console-error.ts'],
          testTimeout: 60_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
