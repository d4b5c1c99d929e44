/**
 * Work worth doing before it is needed but never in the way: run when the browser is idle (at the
 * latest after `timeoutMs`), or after a short wait where there is no idle callback (Safari).
 * Returns how to call it off.
 */
export function whenIdle(fn: () => void, timeoutMs = 2000): () => void {
  if (typeof window === 'undefined') return () => undefined;
  if (typeof window.requestIdleCallback === 'function') {
    const id = window.requestIdleCallback(() => fn(), { timeout: timeoutMs });
    return () => window.cancelIdleCallback(id);
  }
  const t = setTimeout(fn, Math.min(500, timeoutMs));
  return () => clearTimeout(t);
}
