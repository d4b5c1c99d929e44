import { defineConfig } from 'vitest/config';
import { BaseSequencer, type TestSpecification } from 'vitest/node';
import path from 'node:path';

/**
 * Two projects, one `vitest run`:
 *  - `pure`: suites of pure code that never open a database. They skip the database set-up and
 *    so `npx vitest run tests/checks` starts at once. Listed here by folder (and, in folders
 *    that hold both kinds, by file); a new folder or file is in `db` until it is added here.
 *  - `db`: everything else. Its global set-up provides a migrated PGlite template
 *    (tests/setup/global.ts, cached between runs); each file clones it (tests/helpers/db.ts).
 */
const PURE_FOLDERS = ['geometry', 'checks', 'layout', 'planning', 'proposals', 'editor', 'fakes', 'adapters', 'layers'];
const PURE_FILES = [
  'sheet/bounded',
  'sheet/compose',
  'sheet/drawing-labels',
  'sheet/editor-preview',
  'sheet/layout-file',
  'sheet/paper',
  'sheet/pdf',
  'sheet/running-dimensions',
  'hardening/start-up',
  'sharing/mail-compose',
  'sharing/pin-geometry',
  'sharing/revision-diff',
  'planning-api/forms',
  'planning-api/quantities',
  'planning-api/summary',
  'uploads/calibration',
];
const TESTS = ['tests/**/*.test.ts', 'tests/**/*.test.tsx'];
const NEVER = ['tests/e2e/**', 'tests/system/**', 'node_modules/**'];
const pure = [...PURE_FOLDERS.flatMap((f) => [`tests/${f}/**/*.test.ts`, `tests/${f}/**/*.test.tsx`]), ...PURE_FILES.map((f) => `tests/${f}.test.ts`)];

/**
 * The longest files start first, so the two workers finish together. Vitest orders by the
 * durations of the last run when it has them; on a fresh clone it has none and would start
 * with the largest files — and the fuzz files are small.
 */
const LONG_FIRST = ['tests/hardening/hostile-input-', 'tests/hardening/access-matrix', 'tests/api/db-thread', 'tests/sharing/access-rows'];

class LongFirst extends BaseSequencer {
  async sort(files: TestSpecification[]): Promise<TestSpecification[]> {
    const rank = (f: TestSpecification) => {
      const i = LONG_FIRST.findIndex((p) => f.moduleId.includes(p));
      return i < 0 ? LONG_FIRST.length : i;
    };
    return (await super.sort(files)).sort((a, b) => rank(a) - rank(b)); // stable: ties keep vitest's order
  }
}

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
    environment: 'node',
    // Transformed by vite so the `next/server` alias above reaches it.
    server: { deps: { inline: ['next-auth'] } },
    // Two workers on two cores; PGlite instances are heavy.
    maxWorkers: 2,
    testTimeout: 20_000,
    hookTimeout: 60_000,
    sequence: { sequencer: LongFirst },
    projects: [
      {
        extends: true,
        test: { name: 'pure', include: pure, exclude: NEVER },
      },
      {
        extends: true,
        test: {
          name: 'db',
          include: TESTS,
          exclude: [...NEVER, ...pure],
          globalSetup: ['tests/setup/global.ts'],
          setupFiles: ['tests/setup/each.ts'],
        },
      },
    ],
  },
});
