/**
 * Builds the production bundle when there is none, or when a source file is newer than it.
 */
import fs from 'node:fs';
import path from 'node:path';
import { spawnSync } from 'node:child_process';

/** Everything the production bundle is built from (the server's services and the local fakes too). */
const SOURCE_DIRS = ['app', 'components', 'lib', 'db', 'server', 'dev', 'drizzle', 'public', 'fonts', 'types'];
const SOURCE_FILES = [
  'next.config.ts', 'tailwind.config.ts', 'postcss.config.mjs', 'tsconfig.json', 'package-lock.json',
  'auth.ts', 'auth.config.ts', 'proxy.ts', 'instrumentation.ts', 'instrumentation-node.ts',
];

function newestMtime(p: string): number {
  if (!fs.existsSync(p)) return 0;
  const stat = fs.statSync(p);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = 0;
  for (const entry of fs.readdirSync(p)) newest = Math.max(newest, newestMtime(path.join(p, entry)));
  return newest;
}

export function buildIsCurrent(root = process.cwd()): boolean {
  const buildId = path.join(root, process.env.NEXT_DIST_DIR ?? '.next', 'BUILD_ID');
  if (!fs.existsSync(buildId)) return false;
  const built = fs.statSync(buildId).mtimeMs;
  const newest = Math.max(...SOURCE_DIRS.map((d) => newestMtime(path.join(root, d))), ...SOURCE_FILES.map((f) => newestMtime(path.join(root, f))));
  return newest <= built;
}

export function buildIfNeeded(root = process.cwd()): void {
  if (buildIsCurrent(root)) {
    console.log('Production build is up to date.');
    return;
  }
  console.log('Building the production bundle (next build)…');
  const started = Date.now();
  const result = spawnSync('npx', ['next', 'build'], { cwd: root, stdio: 'inherit', env: { ...process.env, NEXT_TELEMETRY_DISABLED: '1' } });
  if (result.status !== 0) throw new Error('next build failed');
  console.log(`Built in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
}
