import { defineConfig } from 'vitest/config';

// Two projects: fast unit tests over the engine, atlas and generators; browser tests over a real build of dist/.
// A third, `slurm` (npm run test:slurm), exists only with ATLAS_TEST_SLURM=1: it brings up a one-node Slurm cluster
// (installing it when missing) and runs job arrays, so plain `npm test` never needs Slurm.
const slurmProject = {
  test: {
    name: 'slurm',
    include: ['test/cluster/**/*.slurm.ts'],
    globalSetup: ['test/cluster/slurm-global-setup.ts'],
    testTimeout: 180_000,
    hookTimeout: 240_000,
    fileParallelism: false,
  },
};

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
      ...(process.env.ATLAS_TEST_SLURM === '1' ? [slurmProject] : []),
    ],
  },
});
