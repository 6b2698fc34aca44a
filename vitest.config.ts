import { defineConfig } from 'vitest/config';
import path from 'node:path';

export default defineConfig({
  resolve: { alias: { '@': path.resolve(__dirname) } },
  test: {
    environment: 'node',
    include: ['tests/unit/**/*.test.ts', 'tests/solver/**/*.test.ts', 'tests/integration/**/*.test.ts'],
    // Database tests share one schema; running files one at a time keeps "no row written" checks honest.
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 60_000,
  },
});
