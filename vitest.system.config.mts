// System tests: against the production server (`next start`), after the build. Run by `npm run test:e2e`.
import { defineConfig } from 'vitest/config';
import path from 'node:path';

export default defineConfig({
  resolve: {
    tsconfigPaths: true,
    alias: { 'server-only': path.resolve(import.meta.dirname, 'tests/setup/server-only.ts') },
  },
  test: {
    include: ['tests/system/**/*.test.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
