import { defineConfig } from 'vitest/config';

// Browser end-to-end tests: the bundled server (dist/api) serving the production web build
// (dist/web), driven through Debian's Chromium by playwright-core. Run by `npm test`.
export default defineConfig({
  test: {
    include: ['tests/e2e/**/*.e2e.ts'],
    globalSetup: ['tests/e2e/support/server-setup.ts'],
    testTimeout: 90_000,
    hookTimeout: 90_000,
    // One browser at a time: two cores, and the tests share one server.
    fileParallelism: false,
  },
});
