import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    setupFiles: ['test/setup.ts'],
    testTimeout: 30_000,
    // Golden and determinism tests spawn processes and rasterise; two cores are all CI has.
    maxWorkers: 2,
  },
});
