import { defineConfig } from 'vitest/config';

// Vitest 4 reads projects from `test.projects` (a file named vitest.workspace.ts is no longer
// picked up on its own), so npm scripts pass this file with --config.
export default defineConfig({
  test: {
    projects: ['packages/*', 'api', 'web', 'e2e'],
  },
});
