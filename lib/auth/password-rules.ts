/**
 * The password rule as forms can check it before sending: length in characters and in bytes.
 * The server adds the common-password list (password-policy.ts), which is too large to ship to
 * the browser. Built with `zod/mini`, as all client validation is. Must never import anything server-only.
 */
import * as z from 'zod/mini';

/** NIST SP 800-63B §5.1.1.2 asks for at least 8; we ask 12 (OWASP ASVS 4.0.3 V2.1.1 asks 12). */
export const PASSWORD_MIN = 12;
/** bcrypt reads only the first 72 bytes; longer passwords are refused rather than silently cut. */
export const PASSWORD_MAX_BYTES = 72;

export const PASSWORD_TOO_SHORT = `use at least ${PASSWORD_MIN} characters`;
export const PASSWORD_TOO_LONG = `use at most ${PASSWORD_MAX_BYTES} bytes (about ${PASSWORD_MAX_BYTES} plain letters)`;

export function passwordBytes(p: string): number {
  return new TextEncoder().encode(p).length;
}

/** Length rules only: for the browser's forms. */
export const passwordLengthSchema = z
  .string()
  .check(z.minLength(PASSWORD_MIN, PASSWORD_TOO_SHORT), z.refine((p) => passwordBytes(p) <= PASSWORD_MAX_BYTES, PASSWORD_TOO_LONG));
