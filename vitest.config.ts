import { defineConfig } from 'vitest/config';

// Two projects: `unit` (pure packages, API units and our lint rules; no services) and `api` (supertest
// against createApp() on the real MariaDB test database, started by scripts/run-tests.ts).
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          // Property tests run hundreds of plans; on a busy 2-core machine 5 s is too tight.
          testTimeout: 30000,
          include: [
            'packages/*/src/**/*.test.ts',
            'apps/api/src/**/*.test.ts',
            'apps/fake-processor/src/**/*.test.ts',
            'tools/**/*.test.ts',
          ],
          environment: 'node',
        },
      },
      './apps/web/vitest.config.ts',
      {
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/api/global-setup.ts'],
          setupFiles: ['tests/api/setup-each-file.ts'],
          fileParallelism: false,
          testTimeout: 20000,
          hookTimeout: 30000,
        },
      },
    ],
  },
});
