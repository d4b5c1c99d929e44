/**
 * A token bucket per key (user id), kept in this process's memory. Enough for one app process;
 * several instances behind a balancer each keep their own buckets, so the effective limit is
 * per instance (README, "Running several instances").
 */
export interface Bucket {
  tokens: number;
  at: number;
}

/** Every limiter this process made (they are module-level singletons): see forgetAllBuckets. */
const everyLimiter = new Set<RateLimiter>();

export class RateLimiter {
  private buckets = new Map<string, Bucket>();

  constructor(private readonly capacity: number, private readonly refillPerSecond: number) {
    everyLimiter.add(this);
  }

  /** Takes one token; false when the key has none left. */
  take(key: string, now = Date.now()): boolean {
    const b = this.buckets.get(key) ?? { tokens: this.capacity, at: now };
    const refilled = Math.min(this.capacity, b.tokens + ((now - b.at) / 1000) * this.refillPerSecond);
    const ok = refilled >= 1;
    this.buckets.set(key, { tokens: ok ? refilled - 1 : refilled, at: now });
    if (this.buckets.size > 10_000) this.prune(now);
    return ok;
  }

  /** Forgets every bucket (tests that make many requests on purpose). */
  clear(): void {
    this.buckets.clear();
  }

  /** Seconds until the key has a token again. */
  retryAfter(key: string): number {
    const b = this.buckets.get(key);
    if (!b || b.tokens >= 1) return 0;
    return Math.ceil((1 - b.tokens) / this.refillPerSecond);
  }

  private prune(now: number) {
    for (const [k, b] of this.buckets) if (now - b.at > 60_000) this.buckets.delete(k);
  }
}

/**
 * Forgets every bucket of every limiter in this process. For the test set-up only: test files that
 * share one process (vitest.config.mts) each start with full buckets, as they would in a process
 * of their own.
 */
export function forgetAllBuckets(): void {
  for (const limiter of everyLimiter) limiter.clear();
}
