import type { TestProject } from 'vitest/node';
import { startThrowawayPostgres } from './postgres-throwaway';

declare module 'vitest' {
  export interface ProvidedContext {
    postgresAdminUrl: string;
  }
}

/**
 * The api-postgres project's server: TEST_DATABASE_URL (a superuser address on a server the tests
 * may create databases on) when given, else a throwaway server started here and stopped after
 * the run.
 */
export default async function setup(
  project: TestProject,
): Promise<(() => Promise<void>) | undefined> {
  const given = process.env.TEST_DATABASE_URL;
  if (given) {
    project.provide('postgresAdminUrl', given);
    return undefined;
  }
  const server = await startThrowawayPostgres();
  project.provide('postgresAdminUrl', server.url);
  return () => server.stop();
}
