import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['e2e/**/*.spec.ts'],
    // One real server and one real browser per spec file; steps wait on the page, not on timers.
    testTimeout: 60_000,
    hookTimeout: 90_000,
    fileParallelism: false,
  },
});
