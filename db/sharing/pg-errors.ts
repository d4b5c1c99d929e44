/**
 * Recognises PostgreSQL's unique-violation (SQLSTATE 23505) through drizzle's error wrapping,
 * so a race lost to a unique index becomes a clear 409 instead of a 500.
 * Must never swallow any other error.
 */
export function isUniqueViolation(err: unknown, constraint?: string): boolean {
  for (let e = err as { code?: unknown; constraint?: unknown; message?: unknown; cause?: unknown } | undefined, depth = 0; e && depth < 4; e = e.cause as typeof e, depth++) {
    if (e.code === '23505') {
      if (!constraint) return true;
      if (e.constraint === constraint || String(e.message ?? '').includes(constraint)) return true;
    }
  }
  return false;
}
