/**
 * The key that signs session tokens. AUTH_SECRET in production; for a local run without one, a
 * random key is made once and kept in ./data/.auth-secret so sessions survive restarts.
 */
import fs from 'node:fs';
import path from 'node:path';
import crypto from 'node:crypto';
import { dataRoot } from '../data-root';

let cached: string | undefined;

export function authSecret(): string {
  if (process.env.AUTH_SECRET) return process.env.AUTH_SECRET;
  if (cached) return cached;
  if (process.env.NODE_ENV === 'production' && process.env.BAYWRIGHT_REQUIRE_SECRET === '1') {
    throw new Error('AUTH_SECRET must be set in production');
  }
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

/** Cookies are Secure when the app is served over HTTPS. */
export function secureCookiesWanted(): boolean {
  return (process.env.AUTH_URL ?? '').startsWith('https://');
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

export function sessionCookieName(): string {
  return secureCookiesWanted() ? '__Secure-authjs.session-token' : 'authjs.session-token';
}
