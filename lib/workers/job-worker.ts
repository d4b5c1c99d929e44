/**
 * One worker thread of the work pool (lib/workers/pool.ts): takes `{ id, name, input }`, runs
 * JOBS[name] (passing on its progress as `{ id, progress }` and the pool's cancel flag) and answers `{ id, ok, output }` or `{ id, ok: false, error }` (the error's class
 * and message only, never a stack). Must never import the database, Next or `server-only`.
 */
import { parentPort } from 'node:worker_threads';
import { JOBS, type JobContext, type JobName } from './jobs';

interface Request {
  id: number;
  name: JobName;
  input: unknown;
  /** The pool sets it to 1 when the caller cancels. */
  cancel?: Int32Array;
}

parentPort?.on('message', async ({ id, name, input, cancel }: Request) => {
  try {
    const job = JOBS[name] as ((input: unknown, context: JobContext) => unknown) | undefined;
    if (!job) throw new Error(`no job named ${name}`);
    const context: JobContext = {
      onProgress: (done, total) => parentPort!.postMessage({ id, progress: { done, total } }),
      cancelled: () => (cancel ? Atomics.load(cancel, 0) === 1 : false),
    };
    const output = await job(input, context);
    const pdf = (output as { pdf?: Uint8Array } | null)?.pdf;
    parentPort!.postMessage({ id, ok: true, output }, pdf instanceof Uint8Array ? [pdf.buffer as ArrayBuffer] : []);
  } catch (err) {
    const e = err instanceof Error ? err : new Error(String(err));
    parentPort!.postMessage({ id, ok: false, error: { name: e.name, message: e.message } });
  }
});
