// Unit and integration tests (everything but the browser tests, which have their own config).
// Tests read the packages' sources (the `bulkhead-source` export condition); CLI tests run the built
// bin, which tests/global-setup.ts rebuilds first so no test runs a stale build.
import { defaultServerConditions } from 'vite';
import { defineConfig } from 'vitest/config';

const conditions = ['bulkhead-source', ...defaultServerConditions];

export default defineConfig({
  resolve: { conditions },
  ssr: { resolve: { conditions } },
  test: {
    include: ['tests/**/*.test.ts'],
    exclude: ['tests/e2e/**', 'node_modules/**'],
    globalSetup: ['tests/global-setup.ts'],
    testTimeout: 60_000,
  },
});
