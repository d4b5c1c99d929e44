import { defineConfig } from 'vitest/config';
import { BaseSequencer, type TestSpecification } from 'vitest/node';
import fs from 'node:fs';
import path from 'node:path';

/**
 * Three projects, one `vitest run`:
 *  - `pure`: suites of pure code that never open a database. They skip the database set-up and
 *    so `npx vitest run tests/checks` starts at once. Listed here by folder (and, in folders
 *    that hold both kinds, by file); a new folder or file is in `db` until it is added here.
 *  - `db`: everything else. Its global set-up provides a migrated PGlite template
 *    (tests/setup/global.ts, cached between runs); each file clones it (tests/helpers/db.ts).
 *  - `isolated`: the files of either kind that swap modules or the environment (SWAPS below).
 * `pure` and `db` files share their worker's module registry (`isolate: false`): a file does not
 * import the app afresh, and must leave no module state behind it (the set-up gives each `db`
 * file full rate-limit buckets and closes its database).
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

/**
 * Test files that swap modules or the environment for their own run (vi.mock, vi.doMock, vi.spyOn,
 * vi.stubEnv, vi.stubGlobal, fake timers, or setting process.env): they run in a module registry of
 * their own (`isolated`). Every other file shares its worker's registry with the files before it
 * (`isolate: false`), which spares each file importing the app again, most of a file's time.
 * Read from the files themselves, so a new file that mocks is isolated without a list to keep.
 */
const SWAPS = /\bvi\.(mock|doMock|spyOn|stubEnv|stubGlobal|useFakeTimers)\(|process\.env\.[A-Z_]+\s*=[^=]/;
function testFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    if (e.isDirectory()) return e.name === 'e2e' || e.name === 'system' ? [] : testFiles(p);
    return /\.test\.tsx?$/.test(e.name) ? [p] : [];
  });
}
const ROOT = import.meta.dirname;
const isolated = testFiles(path.join(ROOT, 'tests'))
  .filter((f) => SWAPS.test(fs.readFileSync(f, 'utf8')))
  .map((f) => path.relative(ROOT, f).split(path.sep).join('/'));
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
        test: { name: 'pure', include: pure, exclude: [...NEVER, ...isolated], isolate: false },
      },
      {
        extends: true,
        test: {
          name: 'db',
          include: TESTS,
          exclude: [...NEVER, ...pure, ...isolated],
          isolate: false,
          globalSetup: ['tests/setup/global.ts'],
          setupFiles: ['tests/setup/each.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'isolated',
          include: isolated,
          exclude: NEVER,
          globalSetup: ['tests/setup/global.ts'],
          setupFiles: ['tests/setup/each.ts'],
        },
      },
    ],
  },
});
