/**
 * The check report of the document a page opens with, begun while the page renders and handed to
 * the editor as a promise (React streams it to the browser), so the findings come with the page
 * instead of after a POST /api/checks from the browser. Never fails the page: when the caller has
 * asked for too many checks, or the work pool is full or the job fails, it resolves to null and
 * the editor asks for its checks as usual.
 */
import 'server-only';
import type { CheckReport } from '@/lib/checks/types';
import type { LayoutDoc, LayoutSettings } from '@/lib/layout/schema';
import { runJob } from '@/lib/workers/pool';
import { RateLimiter } from './rate-limit';

/** Opening pages: a burst of 20, then 10 a second per caller, as POST /api/checks allows (CHECKS_RATE_PER_SECOND). */
const perSecond = Number(process.env.CHECKS_RATE_PER_SECOND ?? 10);
const limiter = new RateLimiter(Math.max(20, perSecond * 2), perSecond);

/** `caller`: whose budget it counts against (a user id, or a viewer link's token). */
export function checksOnOpen(caller: string, doc: LayoutDoc, studioDefaults: LayoutSettings): Promise<CheckReport | null> {
  if (!limiter.take(caller)) return Promise.resolve(null);
  return runJob('checks', { doc, studioDefaults }).catch(() => null);
}

/** Forgets every caller's budget (tests). */
export function resetChecksOnOpen(): void {
  limiter.clear();
}
