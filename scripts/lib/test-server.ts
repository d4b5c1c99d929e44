/**
 * Runs the production build (`next start`) on its own embedded database, for e2e tests,
 * benchmarks and the demo. Seeding runs in a separate process first, because the server holds
 * the database's lock while it runs.
 */
import fs from 'node:fs';
import path from 'node:path';
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { buildIfNeeded } from './build';

export interface TestServer {
  url: string;
  port: number;
  process: ChildProcess;
  stop: () => Promise<void>;
}

export interface TestServerOptions {
  port: number;
  /** Folder name under ./data. */
  db: string;
  seed?: boolean;
  /** Start from an empty folder. */
  fresh?: boolean;
  env?: Record<string, string>;
  quiet?: boolean;
}

export function seedDatabase(db: string, root = process.cwd()): void {
  const result = spawnSync('npx', ['tsx', '--conditions=react-server', 'scripts/seed.ts'], {
    cwd: root,
    stdio: 'inherit',
    env: { ...process.env, BAYWRIGHT_DB: db },
  });
  if (result.status !== 0) throw new Error('seeding the database failed');
}

export async function startTestServer(options: TestServerOptions): Promise<TestServer> {
  const root = process.cwd();
  buildIfNeeded(root);
  const dir = path.join(root, 'data', options.db);
  if (options.fresh) {
    fs.rmSync(dir, { recursive: true, force: true });
    fs.rmSync(`${dir}.pid`, { force: true });
  }
  if (options.seed) seedDatabase(options.db, root);
  // Idle connections stay open for 65 s rather than Node's 5 s: a test's request context that sat
  // idle for about 5 s while a browser worked could send on a socket the server was closing at that
  // moment, and got "socket hang up" (seen once in sharing.spec.ts).
  const child = spawn('npx', ['next', 'start', '-p', String(options.port), '-H', '127.0.0.1', '--keepAliveTimeout', '65000'], {
    cwd: root,
    env: { ...process.env, BAYWRIGHT_DB: options.db, NODE_ENV: 'production', NEXT_TELEMETRY_DISABLED: '1', BAYWRIGHT_LOCAL_FAKES: '1', ...options.env },
    stdio: options.quiet ? ['ignore', 'ignore', 'pipe'] : ['ignore', 'inherit', 'inherit'],
    detached: true,
  });
  // Keep the end of what a quiet server says on stderr, to explain an early exit.
  let stderrTail = '';
  child.stderr?.on('data', (d) => (stderrTail = (stderrTail + String(d)).slice(-2000)));
  const url = `http://127.0.0.1:${options.port}`;
  await waitForOk(url, child, () => stderrTail);
  return {
    url,
    port: options.port,
    process: child,
    stop: () => stopProcessGroup(child),
  };
}

async function waitForOk(url: string, child: ChildProcess, said: () => string = () => '', timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the server exited early (code ${child.exitCode})${said() ? `: ${said().trim()}` : ''}`);
    try {
      const res = await fetch(url, { redirect: 'manual' });
      if (res.status < 500) return;
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`the server at ${url} did not answer within ${timeoutMs / 1000} s`);
}

export async function stopProcessGroup(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || !child.pid) return;
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  try {
    process.kill(-child.pid, 'SIGTERM');
  } catch {
    return;
  }
  const timer = setTimeout(() => {
    try {
      process.kill(-child.pid!, 'SIGKILL');
    } catch {
      /* gone */
    }
  }, 5000);
  await exited;
  clearTimeout(timer);
}
