/**
 * Reduces a callbackUrl to a same-site path and query, so a host mismatch (localhost vs
 * 127.0.0.1) cannot lose it and an outside address can never be a redirect target.
 */
export function safeCallbackPath(raw: string | null | undefined, fallback = '/layouts'): string {
  if (!raw) return fallback;
  try {
    const url = new URL(raw, 'http://placeholder.invalid');
    const path = `${url.pathname}${url.search}`;
    if (!path.startsWith('/') || path.startsWith('//')) return fallback;
    if (path.startsWith('/sign-in') || path.startsWith('/sign-up') || path.startsWith('/api/')) return fallback;
    return path;
  } catch {
    return fallback;
  }
}
