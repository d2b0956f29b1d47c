import { defineProject } from 'vitest/config';

export default defineProject({
  test: {
    name: 'e2e',
    environment: 'node',
    include: ['**/*.e2e.test.ts'],
    globalSetup: ['./support/global-setup.ts'],
    // Each file starts the product and a browser; give them room on a 2-core machine.
    testTimeout: 60000,
    hookTimeout: 90000,
    fileParallelism: false,
    // Pages load lazily split chunks; on a busy 2-core machine the first paint can take seconds.
    expect: { poll: { timeout: 15000, interval: 100 } },
  },
});
