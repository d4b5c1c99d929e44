/**
 * Secret tokens for viewer links and invitations: 256 bits from the operating system's CSPRNG
 * (node:crypto randomBytes), written base64url (43 characters), stored only as a SHA-256 hash.
 * A fast hash is enough here because the token itself carries 256 bits: there is nothing to
 * guess from the hash (OWASP Forgot Password Cheat Sheet, "URL tokens": random, long, stored
 * hashed — secondary citation of its advice on single-use tokens).
 * Must never log, return or store a token after it has been handed to its creator.
 */
import 'server-only';
import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';

/** Bytes of randomness per token: 32 bytes = 256 bits (the brief asks for at least 128). */
export const TOKEN_BYTES = 32;
/** base64url of 32 bytes, unpadded. */
const TOKEN_SHAPE = /^[A-Za-z0-9_-]{43}$/;

export function newToken(): string {
  return randomBytes(TOKEN_BYTES).toString('base64url');
}

/** True when the string could be one of our tokens; anything else is refused before any lookup. */
export function isTokenShaped(token: unknown): token is string {
  return typeof token === 'string' && TOKEN_SHAPE.test(token);
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** Constant-time comparison of a token against a stored hash (for callers that hold both). */
export function tokenMatches(token: string, storedHash: string): boolean {
  const a = Buffer.from(hashToken(token), 'hex');
  const b = Buffer.from(storedHash, 'hex');
  return a.length === b.length && timingSafeEqual(a, b);
}
