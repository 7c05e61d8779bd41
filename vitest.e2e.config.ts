import { defineConfig } from 'vitest/config';

// Browser tests: e2e/*.e2e.ts drive the built app in Debian Chromium through playwright-core.
export default defineConfig({
  test: {
    include: ['e2e/**/*.e2e.ts'],
    environment: 'node',
    testTimeout: 120_000,
    hookTimeout: 120_000,
    fileParallelism: false,
    globalSetup: ['e2e/support/global-setup.ts'],
  },
});
