// Browser tests: playwright-core drives Debian's /usr/bin/chromium against `bulkhead view`. They run
// one file at a time (each starts its own server and browser) after `npm run build -w @bulkhead/viewer`.
// Like the unit tests, they read the packages' sources and rebuild the bin first (tests/global-setup.ts).
import { defaultServerConditions } from 'vite';
import { defineConfig } from 'vitest/config';

const conditions = ['bulkhead-source', ...defaultServerConditions];

export default defineConfig({
  resolve: { conditions },
  ssr: { resolve: { conditions } },
  test: {
    include: ['tests/e2e/**/*.e2e.test.ts'],
    globalSetup: ['tests/global-setup.ts'],
    hookTimeout: 60_000,
    testTimeout: 60_000,
    fileParallelism: false,
  },
});
