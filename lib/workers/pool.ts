/**
 * The work pool: a small fixed set of worker threads that run the heavy, pure jobs of
 * lib/workers/jobs.ts (checks, revision compare, plan sheets) so the request thread keeps
 * answering everyone else. Jobs wait in one first-come queue; when the queue is full a new job is
 * refused at once with `WorkPoolBusyError` (routes answer 503 with Retry-After) rather than piling
 * up. A job that runs past its time limit has its worker replaced and fails with the same error.
 *
 * Sizes come from the environment (README): BAYWRIGHT_WORKERS (threads, default 2),
 * BAYWRIGHT_WORK_QUEUE (waiting jobs, default 16), BAYWRIGHT_JOB_TIMEOUT_MS (default 15000),
 * BAYWRIGHT_WORKER_HEAP_MB (each worker's heap cap, default 512).
 * Workers start with the first job and stop with `closeWorkPool()` (SIGTERM/SIGINT do it too).
 *
 * A job can be cancelled (`{ signal }`): waiting, it leaves the queue; running, it is told through
 * a shared flag the job reads between steps (proposals do, per candidate), and a worker that has
 * not let go within CANCEL_GRACE_MS is replaced, so a cancelled job never keeps a worker busy.
 * Either way the caller gets `JobCancelledError` at once. A job that reports progress
 * (`{ onProgress }`) has it passed on from the worker.
 * Server only.
 */
import 'server-only';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { JobInput, JobName, JobOutput } from './jobs';

export class WorkPoolBusyError extends Error {
  constructor(readonly retryAfterSeconds: number, why = 'The server is busy with other plan sheets and checks') {
    super(`${why}; try again in ${retryAfterSeconds} s.`);
    this.name = 'WorkPoolBusyError';
  }
}

export class WorkPoolClosedError extends Error {
  constructor() {
    super('The server is shutting down.');
    this.name = 'WorkPoolClosedError';
  }
}

/** A job's own error, passed on from the worker (class name and message only). */
export class JobError extends Error {
  constructor(name: string, message: string) {
    super(message);
    this.name = name;
  }
}

/** The caller gave up on the job (its signal aborted): it was taken off the queue or stopped. */
export class JobCancelledError extends Error {
  /** Answered as 499 (the client closed the request) when a route lets it through. */
  readonly status = 499;
  constructor() {
    super('The work was cancelled.');
    this.name = 'JobCancelledError';
  }
}

/** How long a running job has to notice its cancel flag before its worker is replaced (common practice, no source). */
export const CANCEL_GRACE_MS = 300;

export interface RunOptions {
  signal?: AbortSignal;
  onProgress?: (done: number, total: number) => void;
}

export interface WorkPoolOptions {
  size: number;
  queueLimit: number;
  timeoutMs: number;
}

interface Pending {
  id: number;
  name: JobName;
  input: unknown;
  resolve: (v: unknown) => void;
  reject: (e: Error) => void;
  onProgress?: (done: number, total: number) => void;
  /** Set to 1 to tell the running job to stop (read with Atomics in the worker). */
  cancel: Int32Array;
  /** Cancelled and already answered: its worker's late reply is dropped. */
  cancelled: boolean;
  signal?: AbortSignal;
  onAbort?: () => void;
}

interface Slot {
  worker: Worker | null;
  job: Pending | null;
  timer: NodeJS.Timeout | null;
  /** When the running job was handed over (performance.now()). */
  started: number;
}

type Reply =
  | { id: number; ok: true; output: unknown }
  | { id: number; ok: false; error: { name: string; message: string } }
  | { id: number; progress: { done: number; total: number } };

function envInt(name: string, fallback: number, min: number, max: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < min || n > max) throw new Error(`${name} must be a whole number from ${min} to ${max}, got "${raw}"`);
  return n;
}

/** Heap cap of each worker (BAYWRIGHT_WORKER_HEAP_MB, default 512): a runaway job fails alone. */
function workerHeapMb(): number {
  return envInt('BAYWRIGHT_WORKER_HEAP_MB', 512, 64, 16_384);
}

export function workPoolOptionsFromEnv(): WorkPoolOptions {
  return {
    size: envInt('BAYWRIGHT_WORKERS', 2, 1, 64),
    queueLimit: envInt('BAYWRIGHT_WORK_QUEUE', 16, 0, 10_000),
    timeoutMs: envInt('BAYWRIGHT_JOB_TIMEOUT_MS', 15_000, 100, 600_000),
  };
}

/**
 * Starts one worker on lib/workers/job-worker.ts. Inside Next (NEXT_RUNTIME is set) the
 * `new Worker(new URL(…, import.meta.url))` form is the one its bundler follows: it compiles the
 * worker into a chunk of its own. Run from source (vitest, tsx scripts) the file is TypeScript, and
 * the worker loads it through tsx.
 */
function startWorker(): Worker {
  const resourceLimits = { maxOldGenerationSizeMb: workerHeapMb() };
  if (process.env.NEXT_RUNTIME) return new Worker(new URL('./job-worker.ts', import.meta.url), { resourceLimits });
  const file = path.join(path.dirname(fileURLToPath(import.meta.url)), 'job-worker.ts');
  return new Worker(`require('tsx/cjs/api').register(); require(${JSON.stringify(file)});`, { eval: true, resourceLimits });
}

export class WorkPool {
  private readonly slots: Slot[];
  private readonly queue: Pending[] = [];
  private nextId = 1;
  private closed = false;
  /** Recent job times, for the Retry-After estimate. */
  private averageMs = 500;

  constructor(readonly options: WorkPoolOptions, private readonly spawn: () => Worker = startWorker) {
    this.slots = Array.from({ length: options.size }, () => ({ worker: null, job: null, timer: null, started: 0 }));
  }

  /**
   * Starts every worker now rather than at its first job: each loads the jobs' code as it starts,
   * which the first checks after a server start would otherwise wait for (about 0.5 s here).
   */
  warm(): void {
    if (this.closed) return;
    for (const slot of this.slots) if (!slot.worker) this.attach(slot);
  }

  /** Threads in the pool. */
  get size(): number {
    return this.slots.length;
  }

  /** Jobs running and waiting. */
  get load(): { running: number; waiting: number } {
    return { running: this.slots.filter((s) => s.job).length, waiting: this.queue.length };
  }

  run<K extends JobName>(name: K, input: JobInput<K>, options: RunOptions = {}): Promise<JobOutput<K>> {
    if (this.closed) return Promise.reject(new WorkPoolClosedError());
    if (options.signal?.aborted) return Promise.reject(new JobCancelledError());
    const idle = this.slots.find((s) => !s.job);
    if (!idle && this.queue.length >= this.options.queueLimit) {
      const waitMs = ((this.queue.length + this.slots.length) * this.averageMs) / this.slots.length;
      return Promise.reject(new WorkPoolBusyError(Math.max(1, Math.ceil(waitMs / 1000))));
    }
    return new Promise<JobOutput<K>>((resolve, reject) => {
      const job: Pending = {
        id: this.nextId++, name, input, resolve: resolve as (v: unknown) => void, reject, onProgress: options.onProgress,
        cancel: new Int32Array(new SharedArrayBuffer(4)), cancelled: false, signal: options.signal,
      };
      if (options.signal) {
        job.onAbort = () => this.cancel(job);
        options.signal.addEventListener('abort', job.onAbort, { once: true });
      }
      if (idle) this.dispatch(idle, job);
      else this.queue.push(job);
    });
  }

  /** Takes a job off the queue, or tells its worker to stop and frees the worker if it does not. */
  private cancel(job: Pending): void {
    const queued = this.queue.indexOf(job);
    if (queued >= 0) {
      this.queue.splice(queued, 1);
      job.reject(new JobCancelledError());
      return;
    }
    const slot = this.slots.find((s) => s.job === job);
    if (!slot || job.cancelled) return;
    job.cancelled = true;
    Atomics.store(job.cancel, 0, 1);
    job.reject(new JobCancelledError());
    // The slot stays taken until the worker answers (it drops the job's result); past the grace its worker is replaced.
    if (slot.timer) clearTimeout(slot.timer);
    slot.timer = setTimeout(() => {
      if (slot.job !== job) return;
      this.finish(slot, () => undefined);
      const stuck = slot.worker;
      slot.worker = null;
      void stuck?.terminate();
      this.next(slot);
    }, CANCEL_GRACE_MS);
    slot.timer.unref();
  }

  private dispatch(slot: Slot, job: Pending): void {
    const worker = slot.worker ?? this.attach(slot);
    slot.job = job;
    slot.started = performance.now();
    slot.timer = setTimeout(() => {
      // A runaway job: replace its worker so the pool keeps its size.
      this.finish(slot, () => job.reject(new WorkPoolBusyError(1, 'That took longer than the server allows for one request')));
      const stuck = slot.worker;
      slot.worker = null;
      void stuck?.terminate();
      this.next(slot);
    }, this.options.timeoutMs);
    slot.timer.unref();
    worker.postMessage({ id: job.id, name: job.name, input: job.input, cancel: job.cancel });
  }

  private attach(slot: Slot): Worker {
    const worker = this.spawn();
    worker.unref();
    slot.worker = worker;
    worker.on('message', (reply: Reply) => {
      const job = slot.job;
      if (!job || job.id !== reply.id) return;
      if ('progress' in reply) {
        if (!job.cancelled) job.onProgress?.(reply.progress.done, reply.progress.total);
        return;
      }
      if (job.cancelled) {
        this.finish(slot, () => undefined);
        this.next(slot);
        return;
      }
      this.averageMs = 0.8 * this.averageMs + 0.2 * (performance.now() - slot.started);
      this.finish(slot, () => (reply.ok ? job.resolve(reply.output) : job.reject(new JobError(reply.error.name, reply.error.message))));
      this.next(slot);
    });
    const lost = (why: string) => {
      if (slot.worker !== worker) return; // already replaced
      slot.worker = null;
      const job = slot.job;
      if (job) {
        this.finish(slot, () => job.reject(new JobError('WorkerStopped', why)));
        this.next(slot);
      }
    };
    worker.on('error', (err) => lost(`the worker stopped: ${err.message}`));
    worker.on('exit', (code) => lost(`the worker stopped (exit code ${code})`));
    return worker;
  }

  private finish(slot: Slot, settle: () => void): void {
    if (slot.timer) clearTimeout(slot.timer);
    slot.timer = null;
    const job = slot.job;
    if (job?.onAbort) job.signal?.removeEventListener('abort', job.onAbort);
    slot.job = null;
    if (job?.cancelled) return;
    settle();
  }

  private next(slot: Slot): void {
    if (this.closed || slot.job) return;
    const job = this.queue.shift();
    if (job) this.dispatch(slot, job);
  }

  /** Refuses queued jobs, fails running ones and stops every worker. */
  async close(): Promise<void> {
    this.closed = true;
    for (const job of this.queue.splice(0)) job.reject(new WorkPoolClosedError());
    await Promise.all(
      this.slots.map(async (slot) => {
        const job = slot.job;
        if (job) this.finish(slot, () => job.reject(new WorkPoolClosedError()));
        const w = slot.worker;
        slot.worker = null;
        await w?.terminate();
      }),
    );
  }
}

const KEY = Symbol.for('baywright.workPool');
type Holder = { [KEY]?: WorkPool };

/** The process's pool (one per process, kept across dev reloads). */
export function workPool(): WorkPool {
  const holder = globalThis as Holder;
  if (!holder[KEY]) {
    holder[KEY] = new WorkPool(workPoolOptionsFromEnv());
    const stop = () => void closeWorkPool();
    process.once('SIGTERM', stop);
    process.once('SIGINT', stop);
  }
  return holder[KEY];
}

/** Runs a named job of lib/workers/jobs.ts on the pool; `signal` cancels it, `onProgress` hears how far it is. */
export function runJob<K extends JobName>(name: K, input: JobInput<K>, options: RunOptions = {}): Promise<JobOutput<K>> {
  return workPool().run(name, input, options);
}

export async function closeWorkPool(): Promise<void> {
  const holder = globalThis as Holder;
  const pool = holder[KEY];
  delete holder[KEY];
  await pool?.close();
}
