import { defineConfig } from 'vitest/config';
import path from 'node:path';

export default defineConfig({
  resolve: {
    tsconfigPaths: true,
    alias: {
      'server-only': path.resolve(import.meta.dirname, 'tests/setup/server-only.ts'),
      // next-auth imports `next/server` without an extension, which Node's ESM resolver refuses
      // outside Next; the Auth.js route is tested in-process (tests/api/sessions.test.ts).
      'next/server': 'next/server.js',
    },
  },
  test: {
    include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
    exclude: ['tests/e2e/**', 'tests/system/**', 'node_modules/**'],
    environment: 'node',
    // Transformed by vite so the `next/server` alias above reaches it.
    server: { deps: { inline: ['next-auth'] } },
    globalSetup: ['tests/setup/global.ts'],
    setupFiles: ['tests/setup/each.ts'],
    // PGlite instances are heavy; two workers on two cores.
    maxWorkers: 2,
    testTimeout: 20_000,
    hookTimeout: 60_000,
  },
});
