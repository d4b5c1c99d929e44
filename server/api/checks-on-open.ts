/**
 * The check report of the document a page opens with, begun while the page renders, so the
 * findings come with the page instead of after a POST /api/checks from the browser. The page waits
 * a moment for it (`checksForOpening`): ready by then, the report goes in the page and the editor
 * shows its findings with its first frame; not ready, it goes as a promise that React streams to
 * the browser. Never fails the page: when the caller has asked for too many checks, or the work
 * pool is full or the job fails, it resolves to null and the editor asks for its checks as usual.
 */
import 'server-only';
import type { CheckReport } from '@/lib/checks/types';
import type { LayoutDoc, LayoutSettings } from '@/lib/layout/schema';
import { runJob, workPool, type WorkPool } from '@/lib/workers/pool';
import { starterLayout } from '@/lib/layout/templates';
import { RateLimiter } from './rate-limit';

/** Opening pages: a burst of 20, then 10 a second per caller, as POST /api/checks allows (CHECKS_RATE_PER_SECOND). */
const perSecond = Number(process.env.CHECKS_RATE_PER_SECOND ?? 10);
const limiter = new RateLimiter(Math.max(20, perSecond * 2), perSecond);

/** `caller`: whose budget it counts against (a user id, or a viewer link's token). */
export function checksOnOpen(caller: string, doc: LayoutDoc, studioDefaults: LayoutSettings): Promise<CheckReport | null> {
  if (!limiter.take(caller)) return Promise.resolve(null);
  return runJob('checks', { doc, studioDefaults }).catch(() => null);
}

/**
 * How long an opening page waits for its report before it is sent without it (our own choice, no
 * source): a few times what a van's checks take in the pool (about 9 ms at 200 modules, bench),
 * and short beside the page's own reading and drawing.
 */
export const OPENING_WAIT_MS = 100;

/** The report itself (or null) when it came within the wait, else the promise of it. */
export type OpeningChecks = CheckReport | null | Promise<CheckReport | null>;

/**
 * `promise`'s value when it settles within `ms`, else `promise` itself, boxed: an async function
 * that returned the bare promise would be awaited to its end. It never rejects on its own.
 */
export async function settledWithin<T>(promise: Promise<T>, ms: number): Promise<{ ready: true; value: T } | { ready: false; promise: Promise<T> }> {
  const late = Symbol('late');
  let timer: ReturnType<typeof setTimeout> | undefined;
  const first = await Promise.race([promise, new Promise<typeof late>((resolve) => (timer = setTimeout(() => resolve(late), ms)))]);
  clearTimeout(timer);
  return first === late ? { ready: false, promise } : { ready: true, value: first as T };
}

/** `checksOnOpen`, waited for up to `OPENING_WAIT_MS`: the report, or its promise when it is late. */
export async function checksForOpening(caller: string, doc: LayoutDoc, studioDefaults: LayoutSettings, waitMs = OPENING_WAIT_MS): Promise<{ checks: OpeningChecks }> {
  const r = await settledWithin(checksOnOpen(caller, doc, studioDefaults), waitMs);
  return { checks: r.ready ? r.value : r.promise };
}

/**
 * Checks a starter layout once on each of the pool's threads, at start-up: a thread's first checks
 * run slowest (about twice a warm run for 30 modules, more while a browser shares the cores), and
 * the first pages opened after a start would miss `OPENING_WAIT_MS` on it. Never fails.
 */
export async function primeChecks(pool: WorkPool = workPool()): Promise<void> {
  const doc = starterLayout('starter-rear-bed');
  if (!doc) return;
  await Promise.all(Array.from({ length: pool.size }, () => pool.run('checks', { doc }).then(() => undefined, () => undefined)));
}

/** Forgets every caller's budget (tests). */
export function resetChecksOnOpen(): void {
  limiter.clear();
}
