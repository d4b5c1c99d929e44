/**
 * One worker thread of the work pool (lib/workers/pool.ts): takes `{ id, name, input }`, runs
 * JOBS[name] and answers `{ id, ok, output }` or `{ id, ok: false, error }` (the error's class
 * and message only, never a stack). Must never import the database, Next or `server-only`.
 */
import { parentPort } from 'node:worker_threads';
import { JOBS, type JobName } from './jobs';

interface Request {
  id: number;
  name: JobName;
  input: unknown;
}

parentPort?.on('message', async ({ id, name, input }: Request) => {
  try {
    const job = JOBS[name] as ((input: unknown) => unknown) | undefined;
    if (!job) throw new Error(`no job named ${name}`);
    const output = await job(input);
    const pdf = (output as { pdf?: Uint8Array } | null)?.pdf;
    parentPort!.postMessage({ id, ok: true, output }, pdf instanceof Uint8Array ? [pdf.buffer as ArrayBuffer] : []);
  } catch (err) {
    const e = err instanceof Error ? err : new Error(String(err));
    parentPort!.postMessage({ id, ok: false, error: { name: e.name, message: e.message } });
  }
});
