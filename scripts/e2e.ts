// `npm run test:e2e`: builds the production app if needed, runs the system tests against
// `next start` (crash safety, a second process), then Playwright in Debian's Chromium on a fresh,
// seeded database. Fails with a clear message when Chromium is missing.
// `--only=build|system|browser` runs one part (`npm test` runs the parts as steps of their own,
// scripts/test.ts); any other arguments go to Playwright (and skip the system tests).
// Ports: E2E_PORT (default 3210) for the browser tests, SYSTEM_TEST_PORT (default E2E_PORT + 1,
// or 3291) for the system tests' server.
import fs from 'node:fs';
import { spawnSync } from 'node:child_process';
import { buildIfNeeded } from './lib/build';
import { startTestServer } from './lib/test-server';

const chromium = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
const PARTS = ['build', 'system', 'browser'] as const;
type Part = (typeof PARTS)[number];

function run(cmd: string, args: string[], env: Record<string, string> = {}): number {
  const result = spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  return result.status ?? 1;
}

function systemTests(): number {
  const port = process.env.SYSTEM_TEST_PORT ?? (process.env.E2E_PORT ? String(Number(process.env.E2E_PORT) + 1) : '3291');
  return run('npx', ['vitest', 'run', '--config', 'vitest.system.config.mts'], { SYSTEM_TEST_PORT: port });
}

async function browserTests(playwrightArgs: string[]): Promise<number> {
  if (!fs.existsSync(chromium)) {
    console.error(`Chromium was not found at ${chromium}. Install Debian's package: apt-get update && apt-get install -y chromium (or set CHROMIUM_PATH).`);
    return 1;
  }
  const port = Number(process.env.E2E_PORT ?? 3210);
  const server = await startTestServer({ port, db: 'e2e', seed: true, fresh: true, quiet: !process.env.E2E_VERBOSE, env: { BAYWRIGHT_DEMO: '1' } });
  try {
    return run('npx', ['playwright', 'test', ...playwrightArgs], { E2E_BASE_URL: server.url, CHROMIUM_PATH: chromium });
  } finally {
    await server.stop();
  }
}

async function main(): Promise<number> {
  const only = process.argv.find((a) => a.startsWith('--only='))?.slice('--only='.length) as Part | undefined;
  if (only && !PARTS.includes(only)) throw new Error(`--only takes one of ${PARTS.join(', ')}`);
  const playwrightArgs = process.argv.slice(2).filter((a) => !a.startsWith('--only='));
  if (!only && !fs.existsSync(chromium)) return browserTests([]); // says what is missing, before a long build
  buildIfNeeded();
  if (only === 'build') return 0;
  if (only === 'system') return systemTests();
  if (only === 'browser') return browserTests(playwrightArgs);
  if (!playwrightArgs.length && process.env.SKIP_SYSTEM_TESTS !== '1') {
    const status = systemTests();
    if (status !== 0) return status;
  }
  return browserTests(playwrightArgs);
}

main().then(
  (status) => process.exit(status),
  (err) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  },
);
