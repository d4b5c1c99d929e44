import { handle, HttpError, invalid, json, readJson, requireActor } from '@/server/api/respond';
import { RateLimiter } from '@/server/api/rate-limit';
import { clientAddress } from '@/server/auth/address';
import { requireWorkshop } from '@/db/access';
import { issuesFromZod } from '@/lib/layout/parse';
import { bayTemplate } from '@/lib/layout/templates';
import { briefSchema } from '@/lib/proposals/brief';
import { JobCancelledError, runJob, WorkPoolBusyError, WorkPoolClosedError } from '@/lib/workers/pool';
import { NDJSON, progressStream, wantsProgress } from '@/lib/api/progress-stream';
import { log } from '@/lib/log';
import * as z from 'zod/mini';

export const dynamic = 'force-dynamic';

/**
 * One run lays out and checks up to 2,000 candidates (about a second of a worker's time): a burst
 * of 3 per user, then one every 2 seconds; per client address, a burst of 10, then one a second.
 * Common practice, no source.
 */
const limiter = new RateLimiter(3, 0.5);
const addressLimiter = new RateLimiter(10, 1);

/** The brief, naming a bay template this server has (the templates stay off the browser's bundle). */
const knownBayBrief = briefSchema.check(z.refine((b) => b.bay.source !== 'template' || bayTemplate(b.bay.template) !== undefined, { message: 'no such bay template', path: ['bay', 'template'] }));

/** A brief is a small form: 16 KB is generous. */
const MAX_BRIEF_BYTES = 16 * 1024;

/**
 * Proposals from a client's brief (lib/proposals): the workshop's work (owners and designers;
 * clients are refused), run in the work pool (503 + Retry-After when it is full). Nothing is
 * stored: the designer opens a proposal through the layouts route.
 *
 * Asked with `Accept: application/x-ndjson` the answer streams the search's progress, then the
 * result (lib/api/progress-stream.ts); otherwise it is one JSON body. Either way, when the caller
 * goes away (the request aborts, or the stream's reader cancels) the job is cancelled in the pool
 * and its worker freed; a plain request that was cancelled answers 499.
 */
export const POST = handle(async (req) => {
  const actor = await requireActor(req);
  requireWorkshop(actor, 'make proposals');
  if (!limiter.take(actor.userId)) {
    throw new HttpError(429, 'Proposals are being made for you already; wait a moment and try again.', { retryAfter: limiter.retryAfter(actor.userId) });
  }
  const address = clientAddress(req);
  if (!addressLimiter.take(address)) {
    throw new HttpError(429, 'Too many proposal requests from this address; wait a moment.', { retryAfter: addressLimiter.retryAfter(address) });
  }
  const parsed = knownBayBrief.safeParse(await readJson(req, MAX_BRIEF_BYTES));
  if (!parsed.success) throw invalid(issuesFromZod(parsed.error));
  const abort = new AbortController();
  req.signal?.addEventListener('abort', () => abort.abort(), { once: true });
  if (!wantsProgress(req)) return json(await runJob('proposals', { brief: parsed.data }, { signal: abort.signal }));

  let report: (done: number, total: number) => void = () => undefined;
  const job = runJob('proposals', { brief: parsed.data }, { signal: abort.signal, onProgress: (done, total) => report(done, total) });
  // A full pool refuses at once (an already rejected promise wins the race): answer 503 before streaming.
  await Promise.race([job, Promise.resolve()]);
  const body = progressStream((progress) => {
    report = progress;
    return job;
  }, {
    onCancel: () => abort.abort(),
    errorLine: (err) => {
      if (err instanceof JobCancelledError) return undefined;
      if (err instanceof WorkPoolBusyError || err instanceof WorkPoolClosedError) return { error: err.message, status: 503 };
      log.error('proposals stream failed', { route: '/api/proposals', name: err instanceof Error ? err.name : typeof err });
      return { error: 'The proposals could not be made on our side; nothing was changed. Try again.', status: 500 };
    },
  });
  return new Response(body, { status: 200, headers: { 'content-type': NDJSON, 'cache-control': 'no-store' } });
});
