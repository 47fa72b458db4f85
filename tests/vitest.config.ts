import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['e2e/**/*.spec.ts'],
    // One real server and one real browser per spec file; steps wait on the page, not on timers.
    // Generous: CI shares two cores with other suites, and a first Chromium start can be slow there.
    testTimeout: 120_000,
    hookTimeout: 180_000,
    fileParallelism: false,
  },
});
