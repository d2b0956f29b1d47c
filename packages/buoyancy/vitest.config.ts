import { defineProject } from 'vitest/config';

export default defineProject({
  test: {
    name: 'buoyancy',
    environment: 'node',
    include: ['src/**/*.test.ts', 'test/**/*.test.ts'],
    // The first test of a file pays for importing the engine cold; 5 s was seen to be too short
    // on a busy 2-core machine.
    testTimeout: 30_000,
  },
});
