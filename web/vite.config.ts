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
    // antd alone is about 800 kB minified (260 kB gzip); it sits in its own long-cached chunk.
    chunkSizeWarningLimit: 900,
    rolldownOptions: {
      output: {
        // Keep the big libraries in their own long-cached chunks, apart from the app's code.
        codeSplitting: {
          groups: [
            {
              name: 'antd',
              test: /node_modules[\\/](antd|@ant-design|@rc-component|rc-[a-z-]+)[\\/]/,
            },
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
  },
});
