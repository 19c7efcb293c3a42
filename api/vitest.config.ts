import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// API tests run against a real PostgreSQL (DATABASE_URL, a fresh database made by `npm test`);
// files share it, so they run one after another.
export default defineConfig({
  resolve: {
    alias: { '@peakwise/shared': fileURLToPath(new URL('../shared/src/index.ts', import.meta.url)) },
  },
  test: {
    include: ['src/**/*.test.ts', 'test/**/*.test.ts'],
    globalSetup: ['test/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 20_000,
    hookTimeout: 30_000,
  },
});
