import { defineProject, mergeConfig } from 'vitest/config';
import apiProject from './vitest.config';

/**
 * The API suite again, on PostgreSQL: a throwaway server (test/support/postgres-throwaway.ts)
 * unless TEST_DATABASE_URL names one, and a fresh database for every test app. Run it with
 * `npx vitest run --config vitest.workspace.ts --project api-postgres` once it is listed in the
 * root projects, or directly with `cd api && npx vitest run --config vitest.postgres.config.ts`.
 */
export default mergeConfig(
  apiProject,
  defineProject({
    test: {
      name: 'api-postgres',
      globalSetup: ['test/support/postgres-global-setup.ts'],
      setupFiles: ['test/support/postgres-setup-file.ts'],
    },
  }),
);
