import { handle, HttpError, invalid, json, NOT_JSON, readJsonText, requireActor } from '@/server/api/respond';
import { RateLimiter } from '@/server/api/rate-limit';
import { clientAddress } from '@/server/auth/address';
import { runJob } from '@/lib/workers/pool';
import { studioCheckDefaults } from '@/db/studios';

export const dynamic = 'force-dynamic';

/** Live checks while editing: a burst of 20, then 10 a second per user (CHECKS_RATE_PER_SECOND to change; the load benchmark raises it). */
const perSecond = Number(process.env.CHECKS_RATE_PER_SECOND ?? 10);
const limiter = new RateLimiter(Math.max(20, perSecond * 2), perSecond);
/** Per client address as well (server/auth/address), so many accounts behind one address share a bound: five users' worth. */
const addressLimiter = new RateLimiter(Math.max(100, perSecond * 10), perSecond * 5);

/**
 * Parses, validates and checks a posted layout document, all in the work pool (503 + Retry-After
 * when it is full), so a document of thousands of modules costs this thread only reading its text.
 * Nothing is stored.
 */
export const POST = handle(async (req) => {
  const actor = await requireActor(req);
  if (!limiter.take(actor.userId)) {
    throw new HttpError(429, 'Too many check requests; wait a moment.', { retryAfter: limiter.retryAfter(actor.userId) });
  }
  const address = clientAddress(req);
  if (!addressLimiter.take(address)) {
    throw new HttpError(429, 'Too many check requests from this address; wait a moment.', { retryAfter: addressLimiter.retryAfter(address) });
  }
  const checked = await runJob('checkInput', { text: await readJsonText(req), studioDefaults: await studioCheckDefaults(actor) });
  if (checked.ok) return json(checked.report);
  if ('notJson' in checked) throw new HttpError(400, NOT_JSON);
  throw invalid(checked.issues);
});
