import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defaultClientConditions } from 'vite';
import { defineConfig } from 'vitest/config';

const apiTarget = process.env.API_URL ?? 'http://127.0.0.1:3000';

export default defineConfig({
  plugins: [react()],
  resolve: {
    // Read @loftwright/buoyancy from its TypeScript source: no package build needed for the web.
    conditions: ['source', ...defaultClientConditions],
    alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) },
  },
  server: { proxy: { '/api': apiTarget } },
  build: {
    // dist/.vite/manifest.json: which chunks each route pulls in, for the first-route JS budget.
    manifest: true,
    rolldownOptions: {
      output: {
        // React and the router change rarely: their own long-cached chunk. antd is left to the
        // bundler, which splits it by the pages that use each component.
        codeSplitting: {
          groups: [
            {
              name: 'react',
              test: /node_modules[\\/](react|react-dom|react-router|scheduler)[\\/]/,
            },
          ],
        },
      },
    },
  },
  test: {
    name: 'web',
    environment: 'jsdom',
    globals: true,
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['./src/testing/setup-tests.ts'],
    // antd under jsdom renders slowly on a busy two-core CI machine; 5 s was seen to be too short.
    testTimeout: 20_000,
  },
});
