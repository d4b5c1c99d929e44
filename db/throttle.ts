/**
 * Throttles that hold across app instances: one counter row per key in `throttle_counters`,
 * moved only by a single atomic upsert, so racing requests each see the count the one before
 * them left (PostgreSQL locks the row for the upsert; PGlite runs one statement at a time).
 *
 * A rule says how many attempts are free, then how long the wait grows after each further one
 * (doubling from `baseMs` up to `capMs`), and after how long a quiet key starts afresh.
 * `reserve` counts the attempt before the work it guards (a password comparison, a mail), so
 * twenty simultaneous attempts against ten free ones let exactly ten through.
 *
 * Keys are hashed: the table holds no e-mail or network addresses. Must never be bypassed by
 * a caller that reads first and writes later.
 */
import 'server-only';
import { createHash } from 'node:crypto';
import { eq, lt, sql } from 'drizzle-orm';
import { getDb } from './client';
import { throttleCounters } from './schema';

export interface ThrottleRule {
  /** Attempts allowed before any wait. */
  free: number;
  /** The first wait after the free ones; each further attempt doubles it. */
  baseMs: number;
  /** The longest wait. */
  capMs: number;
  /** A key with no counted attempt for this long starts again from nothing. */
  quietMs: number;
  /** Budgets (mail): also start afresh this long after the window's first attempt. */
  windowMs?: number;
}

export type Reservation = { ok: true } | { ok: false; retryAfterS: number };

export function throttleKey(kind: string, ...parts: string[]): string {
  return `${kind}:${createHash('sha256').update(parts.join('\u0000')).digest('base64url').slice(0, 32)}`;
}

/**
 * Counts one attempt under `key` if the rule allows it now; otherwise says how long to wait.
 * One statement: the check and the count cannot be separated by another request.
 */
export async function reserve(key: string, rule: ThrottleRule, now = new Date()): Promise<Reservation> {
  const db = await getDb();
  const quietSince = new Date(now.getTime() - rule.quietMs);
  const t = throttleCounters;
  // The count after this attempt, and the wait it earns (none inside the free allowance).
  const fresh = rule.windowMs
    ? sql`(${t.updatedAt} <= ${quietSince} OR ${t.windowStart} <= ${new Date(now.getTime() - rule.windowMs)})`
    : sql`${t.updatedAt} <= ${quietSince}`;
  const nextCount = sql`(CASE WHEN ${fresh} THEN 1 ELSE ${t.count} + 1 END)`;
  const waitMs = sql`LEAST(${rule.baseMs}::float8 * power(2, ${nextCount} - ${rule.free}), ${rule.capMs}::float8)`;
  const rows = await db
    .insert(t)
    .values({
      key,
      count: 1,
      windowStart: now,
      notBefore: rule.free <= 1 ? new Date(now.getTime() + rule.baseMs) : null,
      updatedAt: now,
    })
    .onConflictDoUpdate({
      target: t.key,
      set: {
        count: nextCount,
        windowStart: sql`CASE WHEN ${fresh} THEN ${now} ELSE ${t.windowStart} END`,
        notBefore: sql`CASE WHEN ${nextCount} >= ${rule.free} THEN ${now}::timestamptz + ${waitMs} * interval '1 millisecond' ELSE NULL END`,
        updatedAt: now,
      },
      setWhere: sql`${fresh} OR ${t.count} + 1 < ${rule.free} OR ${t.notBefore} IS NULL OR ${t.notBefore} <= ${now}`,
    })
    .returning({ count: t.count });
  if (rows.length) {
    if (Math.random() < 0.01) void prune(now).catch(() => undefined);
    return { ok: true };
  }
  const [row] = await db.select({ notBefore: t.notBefore, windowStart: t.windowStart }).from(t).where(eq(t.key, key)).limit(1);
  let until = row?.notBefore?.getTime() ?? now.getTime() + 1000;
  if (rule.windowMs && row) until = Math.min(until, row.windowStart.getTime() + rule.windowMs);
  const waitS = Math.ceil((until - now.getTime()) / 1000);
  return { ok: false, retryAfterS: Math.max(1, waitS) };
}

/**
 * Gives one attempt back (it turned out to be a success, or a later check refused it). A wait
 * already earned stays: a success on one account must not lift the delay on guesses at others.
 */
export async function refund(key: string): Promise<void> {
  const db = await getDb();
  const t = throttleCounters;
  await db.update(t).set({ count: sql`GREATEST(${t.count} - 1, 0)` }).where(eq(t.key, key));
}

/** Forgets a key (a successful sign-in clears its own account-and-address counter). */
export async function clearKey(key: string): Promise<void> {
  const db = await getDb();
  await db.delete(throttleCounters).where(eq(throttleCounters.key, key));
}

/** Rows quiet for a day are dropped now and then, so the table stays small. */
async function prune(now: Date): Promise<void> {
  const db = await getDb();
  await db.delete(throttleCounters).where(lt(throttleCounters.updatedAt, new Date(now.getTime() - 86_400_000)));
}

/** For tests: every counter back to nothing. */
export async function clearAllThrottles(): Promise<void> {
  const db = await getDb();
  await db.delete(throttleCounters);
}
