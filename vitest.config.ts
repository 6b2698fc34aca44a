import { defineConfig } from 'vitest/config';
import path from 'node:path';

export default defineConfig({
  resolve: { alias: { '@': path.resolve(__dirname) } },
  test: {
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 60_000,
    projects: [
      {
        // Pure computation: files run in parallel.
        extends: true,
        test: {
          name: 'solver',
          include: ['tests/unit/**/*.test.ts', 'tests/solver/**/*.test.ts'],
          sequence: { groupOrder: 0 },
        },
      },
      {
        // Database and server tests share one schema; running files one at a time (and after the
        // parallel batch) keeps "no row written" checks honest.
        extends: true,
        test: {
          name: 'database',
          include: ['tests/integration/**/*.test.ts'],
          fileParallelism: false,
          sequence: { groupOrder: 1 },
        },
      },
    ],
  },
});
