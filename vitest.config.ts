import { defineConfig } from 'vitest/config';

// Three projects: pure unit/reference tests, API tests on the real PostgreSQL, browser tests in Chromium.
// scripts/test.mjs prepares the database and the browser before running them.
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          environment: 'node',
          include: ['geometry/**/*.test.ts', 'tests/unit/**/*.test.ts', 'tests/reference/**/*.test.ts', 'server/**/*.test.ts', 'src/**/*.test.ts'],
          testTimeout: 60_000,
        },
      },
      {
        test: {
          name: 'api',
          environment: 'node',
          include: ['tests/api/**/*.test.ts'],
          globalSetup: ['tests/api/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
      {
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/e2e/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 180_000,
        },
      },
    ],
  },
});
