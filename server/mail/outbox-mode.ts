/**
 * Whether the development outbox (/outbox) exists in this process: always outside production;
 * in production only for the demo (BAYWRIGHT_DEMO=1) or when switched on (BAYWRIGHT_OUTBOX=1).
 * Must never read anything but the environment.
 */
export function outboxEnabled(env: Record<string, string | undefined> = process.env): boolean {
  if (env.NODE_ENV !== 'production') return true;
  return env.BAYWRIGHT_DEMO === '1' || env.BAYWRIGHT_OUTBOX === '1';
}
