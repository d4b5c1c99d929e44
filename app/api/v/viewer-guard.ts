/**
 * Shared answers of the viewer-link routes (/api/v/[token]/…): the headers every answer carries
 * (not indexed, no referrer, not cached), a per-address rate limit, and the clear 404 / 410
 * answers for unknown, revoked and expired links. Must never accept a session or a write.
 */
import 'server-only';
import { HttpError } from '@/server/api/respond';
import { RateLimiter } from '@/server/api/rate-limit';
import { clientAddress } from '@/server/auth/address';
import type { ResolvedLink } from '@/db/sharing/viewer-links';

export const VIEWER_HEADERS = {
  'X-Robots-Tag': 'noindex, nofollow',
  'Referrer-Policy': 'no-referrer',
  'Cache-Control': 'no-store, private',
} as const;

/** A live viewer polls once a second; a burst of 60, then 5 a second per address. */
const limiter = new RateLimiter(60, 5);

export function takeViewerToken(req: Request): void {
  const key = clientAddress(req);
  if (!limiter.take(key)) throw new HttpError(429, 'Too many requests for this link; wait a moment.', { retryAfter: limiter.retryAfter(key) });
}

export function refuseUnusable(resolved: Exclude<ResolvedLink, { status: 'active' }>): never {
  if (resolved.status === 'expired') throw new HttpError(410, `This viewer link expired on ${resolved.expiresAt.slice(0, 10)}.`, { status: 'expired' });
  if (resolved.status === 'unknown') throw new HttpError(404, 'There is no viewer link at this address.', { status: 'unknown' });
  // What is left is a withdrawn link; its stored status id goes out as the API's `status`.
  throw new HttpError(410, 'This viewer link was withdrawn by the workshop.', { status: resolved.status });
}

/** Wraps a handler's answer (or error answer) with the viewer headers. */
export function withViewerHeaders(res: Response): Response {
  for (const [k, v] of Object.entries(VIEWER_HEADERS)) res.headers.set(k, v);
  return res;
}
