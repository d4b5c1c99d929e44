/**
 * Long work answered as it goes: newline-delimited JSON, one line `{ done, total }` per progress
 * report, then one final line `{ result }` — or `{ error, status }` when the work failed after the
 * answer had started. The server writes it (`progressStream`), the browser reads it
 * (`readProgressStream`); both sides take the line shapes from here. A caller asks for it with
 * `Accept: application/x-ndjson`; without it the route answers plain JSON as before.
 * Must never import the database or server-only code.
 */
export const NDJSON = 'application/x-ndjson';

export type ProgressLine<T> = { done: number; total: number } | { result: T } | { error: string; status: number };

/** Whether the request asked for the answer as a progress stream. */
export function wantsProgress(req: Request): boolean {
  return (req.headers.get('accept') ?? '').includes(NDJSON);
}

/**
 * Streams `work`'s progress and result. `onCancel` runs when the reader goes away (the browser
 * closed the request), so the work can stop; an error after the stream started is written as its
 * last line through `errorLine` (undefined: the stream just ends, e.g. for a cancelled job).
 */
export function progressStream<T>(
  work: (progress: (done: number, total: number) => void) => Promise<T>,
  options: { onCancel: () => void; errorLine: (err: unknown) => { error: string; status: number } | undefined },
): ReadableStream<Uint8Array> {
  const encoder = new TextEncoder();
  let open = true;
  return new ReadableStream<Uint8Array>({
    start(controller) {
      const write = (line: ProgressLine<T>) => {
        if (open) controller.enqueue(encoder.encode(`${JSON.stringify(line)}\n`));
      };
      work((done, total) => write({ done, total }))
        .then((result) => write({ result }), (err: unknown) => {
          const line = options.errorLine(err);
          if (line) write(line);
        })
        .finally(() => {
          if (open) controller.close();
          open = false;
        });
    },
    cancel() {
      open = false;
      options.onCancel();
    },
  });
}

/** Reads a progress stream to its result, telling `onProgress` each step; throws the server's error line as an Error with `status`. */
export async function readProgressStream<T>(res: Response, onProgress: (done: number, total: number) => void): Promise<T> {
  if (!res.body) throw new Error('The server sent no answer.');
  const reader = res.body.getReader();
  const decoder = new TextDecoder();
  let buffered = '';
  for (;;) {
    const { done, value } = await reader.read();
    buffered += decoder.decode(value, { stream: !done });
    let cut: number;
    while ((cut = buffered.indexOf('\n')) >= 0) {
      const text = buffered.slice(0, cut);
      buffered = buffered.slice(cut + 1);
      if (!text.trim()) continue;
      const line = JSON.parse(text) as ProgressLine<T>;
      if ('result' in line) return line.result;
      if ('error' in line) throw Object.assign(new Error(line.error), { status: line.status });
      onProgress(line.done, line.total);
    }
    if (done) throw new Error('The answer stopped before the work was done.');
  }
}
