import { handle, HttpError, invalid, json, readJson, requireActor } from '@/lib/api/respond';
import { RateLimiter } from '@/lib/api/rate-limit';
import { parseLayoutDoc } from '@/lib/layout/parse';
import { runChecks } from '@/lib/checks';
import { studioCheckDefaults } from '@/db/studios';

export const dynamic = 'force-dynamic';

/** Live checks while editing: a burst of 20, then 10 a second per user (CHECKS_RATE_PER_SECOND to change; the load benchmark raises it). */
const perSecond = Number(process.env.CHECKS_RATE_PER_SECOND ?? 10);
const limiter = new RateLimiter(Math.max(20, perSecond * 2), perSecond);

/** Runs the checks on a posted layout document. Nothing is stored. */
export const POST = handle(async (req) => {
  const actor = await requireActor(req);
  if (!limiter.take(actor.userId)) {
    throw new HttpError(429, 'Too many check requests; wait a moment.', { retryAfter: limiter.retryAfter(actor.userId) });
  }
  const parsed = parseLayoutDoc(await readJson(req));
  if (!parsed.ok) throw invalid(parsed.issues);
  return json(runChecks(parsed.value, { studioDefaults: await studioCheckDefaults(actor) }));
});
