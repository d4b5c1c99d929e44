/**
 * The key that signs session tokens. AUTH_SECRET in production, where a missing one stops the
 * server (never a generated key: it would sign sessions nobody configured). Where local stand-ins
 * are allowed (outside production, the demo, the tests: server/local-mode) a random key is made once
 * and kept in ./data/.auth-secret so sessions survive restarts.
 */
import fs from 'node:fs';
import path from 'node:path';
import crypto from 'node:crypto';
import { dataRoot } from '../../lib/data-root';
import { proxyTrust, publicUrlIsHttps } from './address';
import { localStandInsAllowed } from '../local-mode';

export class MissingAuthSecret extends Error {
  constructor() {
    super('AUTH_SECRET is not set. In production it must be: generate one with `openssl rand -base64 32` and give every instance the same value. (Only the demo and the tests may generate one: BAYWRIGHT_DEMO=1.)');
    this.name = 'MissingAuthSecret';
  }
}

let cached: string | undefined;

export function authSecret(): string {
  if (process.env.AUTH_SECRET) return process.env.AUTH_SECRET;
  if (cached) return cached;
  if (process.env.NEXT_PHASE === 'phase-production-build') {
    // `next build` evaluates this module without serving anyone: a throwaway key, kept nowhere.
    cached = crypto.randomBytes(32).toString('base64url');
    return cached;
  }
  if (!localStandInsAllowed()) throw new MissingAuthSecret();
  const root = dataRoot();
  const file = path.join(root, '.auth-secret');
  try {
    cached = fs.readFileSync(file, 'utf8').trim();
  } catch {
    fs.mkdirSync(root, { recursive: true });
    const secret = crypto.randomBytes(32).toString('base64url');
    try {
      fs.writeFileSync(file, secret, { flag: 'wx', mode: 0o600 });
    } catch {
      /* another process wrote it first */
    }
    cached = fs.readFileSync(file, 'utf8').trim();
  }
  process.env.AUTH_SECRET = cached;
  return cached;
}

/** Cookies are always Secure when the public URL (AUTH_URL or BAYWRIGHT_PUBLIC_URL) is https. */
export function secureCookiesWanted(): boolean {
  return publicUrlIsHttps();
}

/**
 * Auth.js's `useSecureCookies`: always with an https public URL; per request behind a trusted
 * proxy (undefined lets Auth.js follow the request's scheme, which the connection policy in
 * server/auth/address.ts took from the proxy's X-Forwarded-Proto); never otherwise.
 */
export function secureCookiesSetting(): boolean | undefined {
  if (publicUrlIsHttps()) return true;
  return proxyTrust().kind === 'none' ? false : undefined;
}

/** Idle timeout: a session not used for 12 hours ends (each use re-issues the cookie). */
export const SESSION_MAX_AGE_S = 12 * 60 * 60;
/**
 * Absolute lifetime: 7 days after signing in the session ends however busy it was, and the
 * person signs in again (OWASP ASVS 4.0.3 V3.3.2 asks that re-authentication be required
 * periodically; 7 days is our choice within it).
 */
export const SESSION_ABSOLUTE_S = 7 * 24 * 60 * 60;

/** True while a session signed in at `signedInAt` (seconds) is inside its absolute lifetime. */
export function withinAbsoluteLifetime(signedInAt: unknown, nowMs = Date.now()): boolean {
  return typeof signedInAt === 'number' && signedInAt * 1000 <= nowMs + 60_000 && nowMs < (signedInAt + SESSION_ABSOLUTE_S) * 1000;
}

export function sessionCookieName(secure = secureCookiesWanted()): string {
  return secure ? '__Secure-authjs.session-token' : 'authjs.session-token';
}
