/**
 * The embedded database on its own thread. PGlite is PostgreSQL compiled to WebAssembly and runs
 * on the thread that opened it; in the server that thread also runs Next.js, so every request
 * waited for both in turn and the second core sat idle. Here PGlite runs in a worker thread
 * (db/pglite/thread.mjs) and this client gives drizzle the part of PGlite's interface it uses —
 * `query` and `transaction` — over messages. One process still owns the folder (the pid lock is
 * taken here, on the main thread).
 */
import 'server-only';
import { log } from '../../lib/log';
import path from 'node:path';
import { Worker } from 'node:worker_threads';

interface QueryResult {
  rows: unknown[];
  fields: { name: string; dataTypeID: number }[];
  affectedRows?: number;
}

/** What the thread passes on of a database error: SQLSTATE, constraint, detail; never a stack. */
interface ErrorDetail {
  code?: string;
  constraint?: string;
  detail?: string;
  table?: string;
  column?: string;
  severity?: string;
}
const DETAIL_KEYS = ['code', 'constraint', 'detail', 'table', 'column', 'severity'] as const;

interface ErrorFields extends ErrorDetail {
  name: string;
  message: string;
}

type Reply = { id: number; ok: true; result: unknown } | { id: number; ok: false; error: ErrorFields };

// The class carries ErrorDetail's fields (declaration merging), as in-thread errors do.
// eslint-disable-next-line @typescript-eslint/no-empty-object-type, @typescript-eslint/no-unsafe-declaration-merging
export interface PgliteThreadError extends ErrorDetail {}

/** A database error as the caller would have had it in-thread: SQLSTATE and constraint kept. */
// eslint-disable-next-line @typescript-eslint/no-unsafe-declaration-merging
export class PgliteThreadError extends Error {
  constructor(fields: ErrorFields) {
    super(fields.message);
    this.name = fields.name === 'error' || !fields.name ? 'DatabaseError' : fields.name;
    for (const key of DETAIL_KEYS) if (fields[key] !== undefined) this[key] = fields[key];
  }
}

const THREAD_FILE = path.join(/* turbopackIgnore: true */ process.cwd(), 'db', 'pglite', 'thread.mjs');

interface Queryable {
  query(sql: string, params?: unknown[], options?: { rowMode?: 'array' | 'object' }): Promise<QueryResult>;
}

export class PgliteThreadClient implements Queryable {
  private nextId = 1;
  private pending = new Map<number, { resolve: (v: unknown) => void; reject: (e: Error) => void }>();
  private closed = false;

  private constructor(private readonly worker: Worker) {
    worker.on('message', (reply: Reply) => {
      const waiting = this.pending.get(reply.id);
      if (!waiting) return;
      this.pending.delete(reply.id);
      if (reply.ok) waiting.resolve(reply.result);
      else waiting.reject(new PgliteThreadError(reply.error));
    });
    worker.on('exit', (code) => {
      const failure = new Error(`the database thread stopped (exit code ${code})`);
      for (const waiting of this.pending.values()) waiting.reject(failure);
      this.pending.clear();
      if (!this.closed) {
        // Serving on without the database would only answer 500s: stop, so a supervisor restarts.
        log.error('database thread failed; stopping the server', { error: failure });
        process.exit(1);
      }
    });
  }

  /** Starts the thread, which opens and migrates the folder; rejects with its error if it cannot. */
  static open(dir: string, migrationsFolder: string | null): Promise<PgliteThreadClient> {
    const worker = new Worker(THREAD_FILE, { workerData: { dir, migrationsFolder } });
    return new Promise((resolve, reject) => {
      const onError = (err: Error) => reject(err);
      worker.once('error', onError);
      worker.once('message', (msg: { ready: boolean; error?: ErrorFields }) => {
        worker.off('error', onError);
        if (msg.ready) return resolve(new PgliteThreadClient(worker));
        void worker.terminate();
        reject(new PgliteThreadError(msg.error ?? { name: 'Error', message: 'the database thread did not start' }));
      });
    });
  }

  private call<T>(op: string, body: Record<string, unknown> = {}): Promise<T> {
    if (this.closed) return Promise.reject(new Error('the database is closed'));
    const id = this.nextId++;
    return new Promise<T>((resolve, reject) => {
      this.pending.set(id, { resolve: resolve as (v: unknown) => void, reject });
      this.worker.postMessage({ id, op, ...body });
    });
  }

  query(sql: string, params: unknown[] = [], options: { rowMode?: 'array' | 'object' } = {}): Promise<QueryResult> {
    return this.call('query', { sql, params, rowMode: options.rowMode });
  }

  exec(sql: string): Promise<QueryResult[]> {
    return this.call('exec', { sql });
  }

  /** Like PGlite's: commits when `fn` resolves, rolls back when it throws. */
  async transaction<T>(fn: (tx: Queryable & { exec(sql: string): Promise<QueryResult[]> }) => Promise<T>): Promise<T> {
    const tx = await this.call<number>('begin');
    const scoped = {
      query: (sql: string, params: unknown[] = [], options: { rowMode?: 'array' | 'object' } = {}) => this.call<QueryResult>('query', { sql, params, rowMode: options.rowMode, tx }),
      exec: (sql: string) => this.call<QueryResult[]>('exec', { sql, tx }),
    };
    let result: T;
    try {
      result = await fn(scoped);
    } catch (err) {
      await this.call('end', { tx, commit: false }).catch(() => undefined);
      throw err;
    }
    await this.call('end', { tx, commit: true });
    return result;
  }

  /** The data folder as a gzipped tarball (PGlite's dumpDataDir), for backups. */
  dump(): Promise<Uint8Array> {
    return this.call<Uint8Array>('dump');
  }

  async close(): Promise<void> {
    if (this.closed) return;
    try {
      await this.call('close');
    } finally {
      this.closed = true;
      await this.worker.terminate();
    }
  }
}
