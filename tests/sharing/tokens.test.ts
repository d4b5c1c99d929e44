// Viewer-link and invitation tokens: enough entropy from the CSPRNG, a fixed shape, stored only as
// a hash. Letters of revisions. (The 128-bit floor is the brief's; NIST SP 800-63B §5.1.1.2 asks
// for at least 64 bits for look-up secrets — secondary, from memory — so 256 bits is ample.)
import { describe, expect, it } from 'vitest';
import { hashToken, isTokenShaped, newToken, tokenMatches, TOKEN_BYTES } from '@/db/sharing/tokens';
import { revisionLetter } from '@/db/sharing/revisions';

describe('newToken', () => {
  it('carries at least 128 bits (it carries 256)', () => {
    const t = newToken();
    expect(TOKEN_BYTES * 8).toBeGreaterThanOrEqual(128);
    expect(Buffer.from(t, 'base64url')).toHaveLength(TOKEN_BYTES);
    expect(t).toMatch(/^[A-Za-z0-9_-]{43}$/);
  });

  it('never repeats across 5 000 draws and its bits are balanced', () => {
    const tokens = Array.from({ length: 5000 }, newToken);
    expect(new Set(tokens).size).toBe(tokens.length);
    let ones = 0;
    for (const t of tokens) for (const byte of Buffer.from(t, 'base64url')) for (let b = 0; b < 8; b++) ones += (byte >> b) & 1;
    const bits = tokens.length * TOKEN_BYTES * 8;
    // 1.28 M fair coin flips: the share of ones sits within 0.5 ± 0.005 (about 11 standard deviations).
    expect(Math.abs(ones / bits - 0.5)).toBeLessThan(0.005);
  });
});

describe('hashToken', () => {
  it('is SHA-256 hex, differs from the token and matches only its own token', () => {
    const t = newToken();
    const h = hashToken(t);
    expect(h).toMatch(/^[0-9a-f]{64}$/);
    expect(h).not.toContain(t);
    expect(tokenMatches(t, h)).toBe(true);
    expect(tokenMatches(newToken(), h)).toBe(false);
    expect(tokenMatches(t, 'abcd')).toBe(false);
  });

  it('refuses strings that are not token-shaped', () => {
    for (const bad of ['', 'short', `${newToken()}x`, 'a'.repeat(42) + '/', null, 42, '../../etc/passwd']) expect(isTokenShaped(bad)).toBe(false);
    expect(isTokenShaped(newToken())).toBe(true);
  });
});

describe('revisionLetter', () => {
  it('letters revisions A…Z, then AA, AB…', () => {
    expect([1, 2, 26, 27, 28, 52, 53, 702, 703].map(revisionLetter)).toEqual(['A', 'B', 'Z', 'AA', 'AB', 'AZ', 'BA', 'ZZ', 'AAA']);
  });
  it('refuses numbers below 1 and fractions', () => {
    expect(() => revisionLetter(0)).toThrow(RangeError);
    expect(() => revisionLetter(1.5)).toThrow(RangeError);
  });
});
