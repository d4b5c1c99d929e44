/**
 * Sends signed-out visitors of private pages to the sign-in page. Comfort only: it is not a
 * security boundary — every route handler and page checks the session itself.
 */
import NextAuth from 'next-auth';
import { authConfig } from './auth.config';

const { auth } = NextAuth(authConfig);
export default auth;

export const config = {
  matcher: ['/((?!api|_next/static|_next/image|favicon.ico|templates|v/).*)'],
};
