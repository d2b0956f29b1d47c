import { defineConfig } from 'vitest/config';

// Vitest 4 reads projects from `test.projects` (a file named vitest.workspace.ts is no longer
// picked up on its own), so npm scripts pass this file with --config.
export default defineConfig({
  test: {
    // The contract package has no behaviour of its own to test: the compiler checks it on both sides.
    projects: ['packages/buoyancy', 'api', 'web', 'e2e'],
    // Sized for the 2-core machine CI runs on: each API test file boots the app and the browser
    // tests run a product and a chromium, so more workers than cores only adds waiting.
    // `--maxWorkers` on the command line overrides it on a bigger machine.
    maxWorkers: 2,
  },
});
