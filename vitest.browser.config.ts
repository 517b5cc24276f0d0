import { defineConfig } from 'vitest/config';

// Browser flows in headless Chromium (playwright-core) against the production build.
export default defineConfig({
  test: {
    include: ['test/browser/**/*.test.ts'],
    environment: 'node',
    globalSetup: ['test/browser/globalSetup.ts'],
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
