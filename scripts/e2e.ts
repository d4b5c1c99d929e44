// `npm run test:e2e`: builds the production app if needed, runs the system tests against
// `next start` (crash safety, a second process), then Playwright in Debian's Chromium on a fresh,
// seeded database. Fails with a clear message when Chromium is missing.
import fs from 'node:fs';
import { spawnSync } from 'node:child_process';
import { buildIfNeeded } from './lib/build';
import { startTestServer } from './lib/test-server';

const chromium = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
if (!fs.existsSync(chromium)) {
  console.error(`Chromium was not found at ${chromium}. Install Debian's package: apt-get update && apt-get install -y chromium (or set CHROMIUM_PATH).`);
  process.exit(1);
}

function run(cmd: string, args: string[], env: Record<string, string> = {}): number {
  const result = spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  return result.status ?? 1;
}

async function main() {
  buildIfNeeded();
  const playwrightArgs = process.argv.slice(2);
  if (!playwrightArgs.length && process.env.SKIP_SYSTEM_TESTS !== '1') {
    const status = run('npx', ['vitest', 'run', '--config', 'vitest.system.config.mts']);
    if (status !== 0) process.exit(status);
  }
  const port = Number(process.env.E2E_PORT ?? 3210);
  const server = await startTestServer({ port, db: 'e2e', seed: true, fresh: true, quiet: !process.env.E2E_VERBOSE, env: { BAYWRIGHT_DEMO: '1' } });
  let status = 1;
  try {
    status = run('npx', ['playwright', 'test', ...playwrightArgs], { E2E_BASE_URL: server.url, CHROMIUM_PATH: chromium });
  } finally {
    await server.stop();
  }
  process.exit(status);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
