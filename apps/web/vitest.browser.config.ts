import { defineConfig } from 'vitest/config';

/**
 * Browser tests: Debian Chromium driven by playwright-core against the built app, served
 * by the built API on a test database (see e2e/global-setup.ts). `npm test` runs them
 * after `npm run build`.
 */
export default defineConfig({
  test: {
    include: ['e2e/**/*.e2e.ts'],
    environment: 'node',
    globalSetup: ['./e2e/global-setup.ts'],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    // One browser at a time suits a two-core machine and keeps the shared demo data predictable.
    fileParallelism: false,
  },
});
