/**
 * Start-up time of the production server: to its first 200 (the sign-in page, which reads no
 * data) and to the database answering (the first 200 from /api/health, which runs a query); cold
 * (a new, empty data folder, so the embedded database is created and migrated) and warm (the same
 * folder again). The database opens in the background (instrumentation-node.ts), so the two differ.
 */
import fs from 'node:fs';
import path from 'node:path';
import { spawn } from 'node:child_process';
import { buildIfNeeded } from '../scripts/lib/build';
import { stopProcessGroup } from '../scripts/lib/test-server';
import { round } from './stats';

/** Until nothing answers on the port: the server of the previous round may still be closing. */
async function portFree(port: number): Promise<void> {
  for (let i = 0; i < 200; i++) {
    try {
      await fetch(`http://127.0.0.1:${port}/api/health`);
    } catch {
      return;
    }
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`port ${port} is still answering`);
}

interface StartTimes { pageS: number; databaseS: number }

async function until200(url: string, started: number): Promise<number> {
  for (;;) {
    try {
      const res = await fetch(url);
      if (res.status === 200) return (performance.now() - started) / 1000;
    } catch {
      /* not yet */
    }
    if (performance.now() - started > 60_000) throw new Error(`no 200 from ${url} within 60 s`);
    await new Promise((r) => setTimeout(r, 25));
  }
}

async function timeToFirst200(db: string, port: number): Promise<StartTimes> {
  await portFree(port);
  const started = performance.now();
  // The next binary itself, as a process manager would start it: npx would add its own start-up.
  const child = spawn(process.execPath, ['node_modules/next/dist/bin/next', 'start', '-p', String(port), '-H', '127.0.0.1'], {
    env: { ...process.env, BAYWRIGHT_DB: db, NODE_ENV: 'production', BAYWRIGHT_LOCAL_FAKES: '1' },
    stdio: 'ignore',
    detached: true,
  });
  try {
    const pageS = await until200(`http://127.0.0.1:${port}/sign-in`, started);
    const databaseS = await until200(`http://127.0.0.1:${port}/api/health`, started);
    return { pageS, databaseS };
  } finally {
    await stopProcessGroup(child);
  }
}

export interface StartupFigures {
  /** To the first 200 (sign-in), s. */
  coldS: number;
  warmS: number;
  /** To the database answering (/api/health), s. */
  coldDatabaseS: number;
  warmDatabaseS: number;
}

export async function benchStartup(): Promise<StartupFigures> {
  buildIfNeeded();
  const db = 'bench-startup';
  const dir = path.join(process.cwd(), 'data', db);
  fs.rmSync(dir, { recursive: true, force: true });
  fs.rmSync(`${dir}.pid`, { force: true });
  const port = Number(process.env.BENCH_STARTUP_PORT ?? 3310);
  const cold = await timeToFirst200(db, port);
  const warm: StartTimes[] = [];
  for (let i = 0; i < 3; i++) warm.push(await timeToFirst200(db, port));
  return {
    coldS: round(cold.pageS, 2),
    warmS: round(Math.min(...warm.map((w) => w.pageS)), 2),
    coldDatabaseS: round(cold.databaseS, 2),
    warmDatabaseS: round(Math.min(...warm.map((w) => w.databaseS)), 2),
  };
}

if (process.argv[1]?.endsWith('startup.ts')) benchStartup().then((r) => console.log(r));
