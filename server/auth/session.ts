/**
 * Reading the caller, for route handlers and pages: the session cookie is read and decoded with
 * Auth.js's own `getToken` and `decode` (the claims are cached by token text, see token-cache),
 * then the user, their session version (sign-out bumps it) and their membership are read from
 * the database. The role inside the token is never trusted for a decision.
 */
import 'server-only';
import { headers } from 'next/headers';
import { decode, getToken } from 'next-auth/jwt';
import { loadActor, type Actor } from '@/db/actor';
import { authSecret, sessionCookieName, withinAbsoluteLifetime } from './secret';
import { requestIsSecure } from './address';
import { decodeCached, type SessionClaims } from './token-cache';

export async function actorFromRequest(req: Request): Promise<Actor | null> {
  // Over HTTPS only the __Secure- cookie counts (a plain one could have been planted over HTTP).
  const secure = requestIsSecure(req);
  const cookieName = sessionCookieName(secure);
  const raw = await getToken({ req, secureCookie: secure, cookieName, raw: true });
  if (!raw) return null;
  const token = await decodeCached(`${cookieName}=${raw}`, (key) => decodeSessionToken(key.slice(cookieName.length + 1), cookieName));
  if (typeof token?.uid !== 'string') return null;
  if (!withinAbsoluteLifetime(token.sat)) return null; // 7 days after signing in, however busy

  return loadActor(token.uid, typeof token.studioId === 'string' ? token.studioId : undefined, typeof token.sv === 'number' ? token.sv : undefined);
}

async function decodeSessionToken(raw: string, cookieName: string): Promise<SessionClaims | null> {
  try {
    return (await decode({ token: raw, secret: authSecret(), salt: cookieName })) as SessionClaims | null;
  } catch {
    return null; // tampered, expired or made with another secret
  }
}

/** For server components: the same check, reading the incoming request's cookies. */
export async function currentActor(): Promise<Actor | null> {
  const incoming = await headers();
  const forwarded = incoming.get('x-forwarded-proto');
  return actorFromRequest(new Request('http://internal/', { headers: { cookie: incoming.get('cookie') ?? '', ...(forwarded ? { 'x-forwarded-proto': forwarded } : {}) } }));
}
