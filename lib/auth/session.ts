/**
 * Reading the caller, for route handlers and pages: the session cookie is decoded with Auth.js's
 * own `getToken`, then the user, their session version (sign-out bumps it) and their membership
 * are read from the database. The role inside the token is never trusted for a decision.
 */
import 'server-only';
import { headers } from 'next/headers';
import { getToken } from 'next-auth/jwt';
import { loadActor, type Actor } from '@/db/actor';
import { authSecret, sessionCookieName, secureCookiesWanted } from './secret';

export async function actorFromRequest(req: Request): Promise<Actor | null> {
  const token = await getToken({
    req,
    secret: authSecret(),
    secureCookie: secureCookiesWanted(),
    cookieName: sessionCookieName(),
    salt: sessionCookieName(),
  });
  if (!token?.uid) return null;
  return loadActor(token.uid, token.studioId, token.sv);
}

/** For server components: the same check, reading the incoming request's cookies. */
export async function currentActor(): Promise<Actor | null> {
  const cookie = (await headers()).get('cookie') ?? '';
  return actorFromRequest(new Request('http://internal/', { headers: { cookie } }));
}
