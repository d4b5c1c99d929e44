/**
 * The database-free half of Auth.js: session strategy, pages and the callbacks that carry the
 * user id and role in the JWT. Shared by the proxy and by `auth.ts`. A session ends 12 hours
 * after its last use or 7 days after signing in, whichever comes first; `auth.ts` adds the
 * database checks (signed out, removed from the studio).
 * The proxy only redirects signed-out visitors for comfort; every route handler checks again.
 */
import type { NextAuthConfig } from 'next-auth';
import { authSecret, SESSION_MAX_AGE_S, secureCookiesSetting, withinAbsoluteLifetime } from './server/auth/secret';

export const authConfig = {
  trustHost: true,
  secret: authSecret(),
  useSecureCookies: secureCookiesSetting(),
  session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE_S },
  pages: { signIn: '/sign-in' },
  providers: [],
  callbacks: {
    // Returning null ends the session: Auth.js clears the cookie instead of re-issuing it.
    jwt({ token, user }) {
      if (user) {
        token.uid = user.id as string;
        token.role = user.role;
        token.studioId = user.studioId;
        token.sv = user.sessionVersion;
        token.sat = Math.floor(Date.now() / 1000);
        return token;
      }
      return withinAbsoluteLifetime(token.sat) ? token : null;
    },
    session({ session, token }) {
      session.user.id = token.uid as string;
      session.user.role = token.role;
      session.user.studioId = token.studioId;
      return session;
    },
  },
} satisfies NextAuthConfig;
