import { existsSync } from 'node:fs';
import { defineConfig } from 'vitest/config';

const integrationSetup = 'tests/integration/setup/global-setup.ts';

// Three projects, chosen with `vitest run --project <name>` (scripts/src/test.ts sets their environment).
// TypeORM migrations are an explicit array (api/src/db/migrations/index.ts): a glob fails under vitest.
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          environment: 'node',
          include: [
            'shared/src/**/*.test.ts',
            'api/src/**/*.test.ts',
            'web/src/**/*.test.{ts,tsx}',
            'web/*.test.ts',
            'scripts/src/**/*.test.ts',
          ],
        },
      },
      {
        test: {
          name: 'integration',
          environment: 'node',
          include: ['tests/integration/**/*.test.ts'],
          globalSetup: existsSync(integrationSetup) ? [integrationSetup] : [],
          fileParallelism: false,
          // bcrypt at cost 12 takes ~0.3 s a hash on these 2-core machines; a few tests sign in many accounts.
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.test.ts'],
          fileParallelism: false,
          testTimeout: 90_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
