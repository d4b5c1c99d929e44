/**
 * The one database handle of a process. PGlite (embedded PostgreSQL) under `./data/<BAYWRIGHT_DB>`
 * by default; a PostgreSQL server through node-postgres when DATABASE_URL is set. Both sit behind
 * the same drizzle interface, so nothing above this file knows which one it has.
 *
 * Opened lazily (never during `next build`), held once per process on globalThis (dev hot reload
 * would otherwise open the folder again), guarded by a pid lock file because PGlite has no lock
 * of its own, closed on SIGTERM/SIGINT. Must never be imported by client components.
 */
import 'server-only';
import fs from 'node:fs';
import path from 'node:path';
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import * as schema from './schema';
import { dataRoot } from '../lib/data-root';

export type Db = PgDatabase<PgQueryResultHKT, typeof schema>;

interface DbHandle {
  db: Db;
  kind: 'pglite' | 'postgres';
  close: () => Promise<void>;
  /** Embedded database only: a consistent gzipped tarball of its folder (for `npm run db:backup`). */
  dump?: () => Promise<Uint8Array>;
}

const MIGRATIONS = path.join(/* turbopackIgnore: true */ process.cwd(), 'drizzle');

type GlobalWithDb = typeof globalThis & { __baywrightDb?: Promise<DbHandle> };
const g = globalThis as GlobalWithDb;

/** The folder PGlite keeps its data in: ./data/<name>, name from BAYWRIGHT_DB (default "dev"). */
export function dataDir(name = process.env.BAYWRIGHT_DB ?? 'dev'): string {
  if (!/^[a-z0-9][a-z0-9_-]*$/i.test(name)) throw new Error(`BAYWRIGHT_DB must be a plain folder name, got "${name}"`);
  return path.join(/* turbopackIgnore: true */ dataRoot(), name);
}

export function getDb(): Promise<Db> {
  return getHandle().then((h) => h.db);
}

export function getHandle(): Promise<DbHandle> {
  if (!g.__baywrightDb) {
    g.__baywrightDb = open().catch((err) => {
      g.__baywrightDb = undefined;
      throw err;
    });
  }
  return g.__baywrightDb;
}

/** Tests hand in their own (cloned, migrated) instance. */
export function installDbHandle(handle: DbHandle): void {
  g.__baywrightDb = Promise.resolve(handle);
}

export async function closeDb(): Promise<void> {
  const pending = g.__baywrightDb;
  g.__baywrightDb = undefined;
  if (pending) await (await pending).close();
}

async function open(): Promise<DbHandle> {
  const url = process.env.DATABASE_URL;
  const handle = url ? await openPostgres(url) : await openPglite(dataDir(), { thread: process.env.BAYWRIGHT_DB_THREAD !== 'main' });
  registerShutdown();
  return handle;
}

async function openPostgres(url: string): Promise<DbHandle> {
  const { Pool } = await import('pg');
  const { drizzle } = await import('drizzle-orm/node-postgres');
  const { migrate } = await import('drizzle-orm/node-postgres/migrator');
  const pool = new Pool({ connectionString: url, max: Number(process.env.DATABASE_POOL_MAX ?? 10) });
  const db = drizzle(pool, { schema }) as unknown as Db;
  await migrate(drizzle(pool, { schema }), { migrationsFolder: MIGRATIONS });
  return { db, kind: 'postgres', close: () => pool.end() };
}

/**
 * Opens (and migrates) the embedded database. With `thread`, PGlite runs in a worker thread so
 * queries and Next.js use both cores (db/pglite/thread-client.ts); scripts and tests keep it on
 * their own thread.
 */
export async function openPglite(dir: string, options: { migrate?: boolean; thread?: boolean } = {}): Promise<DbHandle> {
  // PGlite creates only the last folder of its path.
  fs.mkdirSync(path.dirname(dir), { recursive: true });
  const releaseLock = acquireLock(dir);
  try {
    const opened = options.thread ? await openOnThread(dir, options) : await openInThread(dir, options);
    return {
      db: opened.db,
      kind: 'pglite',
      dump: opened.dump,
      close: async () => {
        await opened.close();
        releaseLock();
      },
    };
  } catch (err) {
    releaseLock();
    throw err;
  }
}

async function openOnThread(dir: string, options: { migrate?: boolean }): Promise<Omit<DbHandle, 'kind'>> {
  const { drizzle } = await import('drizzle-orm/pglite');
  const { PgliteThreadClient } = await import('./pglite/thread-client');
  const client = await PgliteThreadClient.open(dir, options.migrate === false ? null : MIGRATIONS);
  // drizzle uses only `query` and `transaction` of the client it is given.
  return { db: drizzle({ client: client as never, schema }) as unknown as Db, close: () => client.close(), dump: () => client.dump() };
}

async function openInThread(dir: string, options: { migrate?: boolean }): Promise<Omit<DbHandle, 'kind'>> {
  const { drizzle } = await import('drizzle-orm/pglite');
  const { PGlite } = await import('@electric-sql/pglite');
  const { migrate } = await import('drizzle-orm/pglite/migrator');
  const { withStatementCache } = await import('./pglite/statements.mjs');
  const { templateFor } = await import('./pglite/template.mjs');
  // A new folder starts from the install-time template when there is one, as on the thread.
  const client = await PGlite.create({ dataDir: dir, loadDataDir: templateFor(dir) });
  // Reads as prepared statements, as on the server's database thread.
  const db = drizzle({ client: withStatementCache(client) as never, schema });
  if (options.migrate !== false) await migrate(db, { migrationsFolder: MIGRATIONS });
  return {
    db: db as unknown as Db,
    close: () => client.close(),
    dump: async () => new Uint8Array(await (await client.dumpDataDir('gzip')).arrayBuffer()),
  };
}

/**
 * PGlite has no lock: two processes on one folder both open it and rows are lost. A pid file
 * beside the folder makes the second one fail loudly instead.
 */
export function acquireLock(dir: string): () => void {
  const lockFile = `${dir}.pid`;
  try {
    fs.writeFileSync(lockFile, String(process.pid), { flag: 'wx' });
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'EEXIST') throw err;
    const holder = Number(fs.readFileSync(lockFile, 'utf8').trim());
    if (holder && holder !== process.pid && isAlive(holder)) {
      throw new DatabaseLockedError(dir, holder);
    }
    // A stale lock from a process that died: take it over.
    fs.writeFileSync(lockFile, String(process.pid));
  }
  return () => {
    try {
      if (fs.readFileSync(lockFile, 'utf8').trim() === String(process.pid)) fs.unlinkSync(lockFile);
    } catch {
      /* already gone */
    }
  };
}

/** The live process (this one included) holding the folder's pid lock, or null. */
export function lockHolder(dir: string): number | null {
  try {
    const holder = Number(fs.readFileSync(`${dir}.pid`, 'utf8').trim());
    return holder && (holder === process.pid || isAlive(holder)) ? holder : null;
  } catch {
    return null;
  }
}

export class DatabaseLockedError extends Error {
  constructor(dir: string, pid: number) {
    super(`The embedded database at ${dir} is already open in process ${pid}. Stop that process, or point BAYWRIGHT_DB at another folder.`);
    this.name = 'DatabaseLockedError';
  }
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
  // A process killed with SIGKILL stays a zombie until its parent reaps it, and signal 0 still
  // reaches a zombie; in a container whose first process never reaps, that can be for ever.
  try {
    const stat = fs.readFileSync(`/proc/${pid}/stat`, 'utf8');
    const state = stat.slice(stat.lastIndexOf(')') + 2).charAt(0);
    return state !== 'Z' && state !== 'X';
  } catch (err) {
    return (err as NodeJS.ErrnoException).code !== 'ENOENT';
  }
}

let shutdownRegistered = false;
function registerShutdown() {
  if (shutdownRegistered || process.env.VITEST) return;
  shutdownRegistered = true;
  const shutdown = (signal: NodeJS.Signals) => {
    closeDb()
      .catch(() => undefined)
      .finally(() => process.exit(signal === 'SIGINT' ? 130 : 143));
  };
  process.once('SIGTERM', shutdown);
  process.once('SIGINT', shutdown);
}
