import { defineConfig } from 'vitest/config';

// Browser tests: Debian's Chromium driven by playwright-core against the built app and real server.
export default defineConfig({
  test: {
    include: ['client/e2e/**/*.e2e.ts'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 120_000,
    fileParallelism: false,
  },
});
