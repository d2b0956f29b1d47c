import { defaultServerConditions } from 'vite';
import { defineProject } from 'vitest/config';

export default defineProject({
  // Read @loftwright/buoyancy from source in tests. Only add the condition: replacing the default
  // server conditions breaks Express inside Nest. Except "module": Vitest hands these conditions
  // to Node as --conditions, and packages whose "module" build is meant for bundlers (the AWS
  // SDK's extensionless imports) cannot then load in plain Node.
  ssr: {
    resolve: {
      conditions: ['source', ...defaultServerConditions.filter((name) => name !== 'module')],
    },
  },
  test: {
    name: 'api',
    environment: 'node',
    include: ['src/**/*.spec.ts', 'test/**/*.e2e-spec.ts'],
    setupFiles: ['reflect-metadata'],
    // bcrypt at production cost and real SQLite files make some cases slower than the default.
    testTimeout: 20000,
    hookTimeout: 30000,
  },
});
