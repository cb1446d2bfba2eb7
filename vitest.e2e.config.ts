// Browser tests: build once (npm test builds before this runs), then drive Debian's Chromium
// through playwright-core. One file at a time: each starts its own server and browser.
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/e2e/**/*.e2e.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
