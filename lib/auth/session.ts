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
import { authSecret, sessionCookieName, secureCookiesWanted, withinAbsoluteLifetime } from './secret';
import { decodeCached, type SessionClaims } from './token-cache';

export async function actorFromRequest(req: Request): Promise<Actor | null> {
  const raw = await getToken({ req, secureCookie: secureCookiesWanted(), cookieName: sessionCookieName(), raw: true });
  if (!raw) return null;
  const token = await decodeCached(raw, decodeSessionToken);
  if (typeof token?.uid !== 'string') return null;
  if (!withinAbsoluteLifetime(token.sat)) return null; // 7 days after signing in, however busy

  return loadActor(token.uid, typeof token.studioId === 'string' ? token.studioId : undefined, typeof token.sv === 'number' ? token.sv : undefined);
}

async function decodeSessionToken(raw: string): Promise<SessionClaims | null> {
  try {
    return (await decode({ token: raw, secret: authSecret(), salt: sessionCookieName() })) as SessionClaims | null;
  } catch {
    return null; // tampered, expired or made with another secret
  }
}

/** For server components: the same check, reading the incoming request's cookies. */
export async function currentActor(): Promise<Actor | null> {
  const cookie = (await headers()).get('cookie') ?? '';
  return actorFromRequest(new Request('http://internal/', { headers: { cookie } }));
}
