/**
 * Runs before every page: gives the page a fresh CSP nonce, and sends signed-out visitors of
 * private pages to the sign-in page. Comfort only for the latter: it is not a security
 * boundary — every route handler and page checks the session itself.
 */
import NextAuth from 'next-auth';
import { NextResponse } from 'next/server';
import { authConfig } from './auth.config';
import { contentSecurityPolicy } from './server/security/csp';

const { auth } = NextAuth(authConfig);

const PRIVATE = ['/layouts', '/clients', '/settings', '/outbox'];

export default auth((req) => {
  const path = req.nextUrl.pathname;
  if (!req.auth?.user && PRIVATE.some((p) => path === p || path.startsWith(`${p}/`))) {
    const signIn = new URL('/sign-in', req.nextUrl);
    signIn.searchParams.set('callbackUrl', `${path}${req.nextUrl.search}`);
    return NextResponse.redirect(signIn);
  }
  const nonce = Buffer.from(crypto.randomUUID()).toString('base64');
  const csp = contentSecurityPolicy(nonce);
  const headers = new Headers(req.headers);
  headers.set('x-nonce', nonce);
  headers.set('Content-Security-Policy', csp);
  const res = NextResponse.next({ request: { headers } });
  res.headers.set('Content-Security-Policy', csp);
  return res;
});

export const config = {
  matcher: [{ source: '/((?!api|_next/|favicon.ico|templates).*)', missing: [{ type: 'header', key: 'next-router-prefetch' }] }],
};
