import { defineConfig } from 'vitest/config';

// Two projects: fast unit tests over the engine, atlas and generators; browser tests over a real build of dist/.
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          include: ['test/**/*.test.ts'],
          exclude: ['test/site/**/*.e2e.test.ts'],
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['test/site/**/*.e2e.test.ts'],
          globalSetup: ['test/site/global-setup.ts'],
          testTimeout: 60_000,
          hookTimeout: 300_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
