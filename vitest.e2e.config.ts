// Browser tests: playwright-core drives Debian's /usr/bin/chromium against `bulkhead view`. They run
// one file at a time (each starts its own server and browser) after `npm run build -w @bulkhead/viewer`.
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/e2e/**/*.e2e.test.ts'],
    hookTimeout: 60_000,
    testTimeout: 60_000,
    fileParallelism: false,
  },
});
