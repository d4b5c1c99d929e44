import { handle, HttpError, invalid, json, readJson, requireActor } from '@/server/api/respond';
import { RateLimiter } from '@/server/api/rate-limit';
import { clientAddress } from '@/server/auth/address';
import { requireWorkshop } from '@/db/access';
import { issuesFromZod } from '@/lib/layout/parse';
import { bayTemplate } from '@/lib/layout/templates';
import { briefSchema } from '@/lib/proposals/brief';
import { runJob } from '@/lib/workers/pool';
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
  return json(await runJob('proposals', { brief: parsed.data }));
});
