import { defineConfig } from 'vitest/config';

// Browser tests: build the site, serve it on localhost, drive Debian's Chromium with playwright-core.
export default defineConfig({
  test: {
    include: ['tests/e2e/**/*.test.ts'],
    globalSetup: ['tests/e2e/globalSetup.ts'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 300_000,
    fileParallelism: false,
  },
});
