/**
 * The caller's network address, for rate limits. Behind a reverse proxy the first
 * X-Forwarded-For entry is the client; the proxy must overwrite that header, not append to a
 * client-sent one. Without a proxy the header is absent and all local callers share one bucket.
 */
export function clientAddress(request: Request | undefined): string {
  const forwarded = request?.headers.get('x-forwarded-for');
  const first = forwarded?.split(',')[0]?.trim();
  if (first) return first.slice(0, 64);
  return request?.headers.get('x-real-ip')?.slice(0, 64) ?? 'local';
}
