import { defineConfig } from 'vitest/config';

// Physics, API, schema and integration tests. Web specs run through `ng test` (Angular's own
// Vitest runner), so web/ is excluded here.
export default defineConfig({
  test: {
    include: [
      'physics/**/*.test.ts',
      'api/**/*.test.ts',
      'schema/**/*.test.ts',
      'demo-data/**/*.test.ts',
      'tests/integration/**/*.test.ts',
    ],
    exclude: ['node_modules/**', 'dist/**', 'web/**'],
    globalSetup: ['tests/support/global-setup.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
    pool: 'forks',
  },
});
