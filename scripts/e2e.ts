// `npm run test:e2e`: Playwright in Debian's Chromium against the production build on a fresh,
// seeded database. Fails with a clear message when Chromium is missing.
import fs from 'node:fs';
import { spawnSync } from 'node:child_process';
import { startTestServer } from './lib/test-server';

const chromium = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
if (!fs.existsSync(chromium)) {
  console.error(`Chromium was not found at ${chromium}. Install Debian's package: apt-get update && apt-get install -y chromium (or set CHROMIUM_PATH).`);
  process.exit(1);
}

async function main() {
  const port = Number(process.env.E2E_PORT ?? 3210);
  const server = await startTestServer({ port, db: 'e2e', seed: true, fresh: true, quiet: !process.env.E2E_VERBOSE, env: { BAYWRIGHT_DEMO: '1' } });
  let status = 1;
  try {
    const result = spawnSync('npx', ['playwright', 'test', ...process.argv.slice(2)], {
      stdio: 'inherit',
      env: { ...process.env, E2E_BASE_URL: server.url, CHROMIUM_PATH: chromium },
    });
    status = result.status ?? 1;
  } finally {
    await server.stop();
  }
  process.exit(status);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
