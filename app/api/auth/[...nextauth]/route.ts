// Auth.js's own endpoints (sign-in callback, session, CSRF token, sign-out), behind one check of
// our own: a `callbackUrl` (query or cookie) that is not a page of this site is refused with a
// plain 400 before Auth.js sees it (Auth.js would answer 500 and log a stack trace).
import { handlers } from '@/auth';
import { refuseForeignCallback } from '@/lib/auth/callback-url';

export async function GET(req: Request): Promise<Response> {
  return refuseForeignCallback(req) ?? handlers.GET(req as never);
}

export async function POST(req: Request): Promise<Response> {
  return refuseForeignCallback(req) ?? handlers.POST(req as never);
}
