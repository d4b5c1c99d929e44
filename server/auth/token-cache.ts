/**
 * Decoding a session token costs a key derivation and an AES + HMAC pass through WebCrypto on
 * every request. A browser sends the same token again and again, so the decoded claims are
 * kept by the token's exact text: the same ciphertext under the same secret always decodes to
 * the same claims. Expiry is checked on every hit; revocation (sign-out, removal from a studio)
 * does not depend on this cache, because the caller is looked up in the database each time.
 */
import 'server-only';
import { Lru } from '../../lib/cache/lru';

export interface SessionClaims {
  uid?: string;
  studioId?: string;
  sv?: number;
  sat?: number;
  exp?: number;
  [claim: string]: unknown;
}

const cache = new Lru<string, SessionClaims>(1000);

function stillValid(claims: SessionClaims, now: number): boolean {
  return typeof claims.exp !== 'number' || claims.exp * 1000 > now;
}

export async function decodeCached(
  raw: string,
  decode: (raw: string) => Promise<SessionClaims | null>,
  now = Date.now(),
): Promise<SessionClaims | null> {
  const hit = cache.get(raw);
  if (hit) {
    if (stillValid(hit, now)) return hit;
    cache.delete(raw);
    return null;
  }
  const claims = await decode(raw);
  if (!claims || !stillValid(claims, now)) return null;
  cache.set(raw, claims);
  return claims;
}

/** For tests. */
export function tokenCacheSize(): number {
  return cache.size;
}

export function clearTokenCache(): void {
  cache.clear();
}
