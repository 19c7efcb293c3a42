import { defineConfig } from 'vitest/config';

// Browser tests drive a real Chromium against a running API (E2E_BASE_URL). One file at a time:
// they share one machine's Chromium and a single test database.
export default defineConfig({
  test: {
    include: ['e2e/**/*.e2e.test.ts'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 60_000,
    fileParallelism: false,
    // A page waits on the API and the fake services; on a busy machine 1 s (the default) is too tight.
    expect: { poll: { timeout: 10_000 } },
  },
});
