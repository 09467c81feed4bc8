import { defineConfig } from 'vitest/config';

/**
 * Three projects: pure web-app logic, pure unit tests, and API tests over HTTP against a real PostgreSQL
 * (each API test file gets its own database cloned from a migrated template).
 */
export default defineConfig({
  test: {
    projects: [
      'apps/web/vitest.config.ts',
      {
        test: {
          name: 'unit',
          include: ['packages/*/src/**/*.test.ts', 'apps/api/src/**/*.test.ts', 'db/**/*.test.ts'],
          environment: 'node',
        },
      },
      {
        test: {
          name: 'api',
          include: ['apps/api/test/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['apps/api/test/global-setup.ts'],
          pool: 'forks',
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
