/**
 * The one password rule for new passwords, on the server: sign-up, accepting an invitation,
 * changing and resetting a password all parse with `newPasswordSchema`.
 *   - at least 12 characters, at most 72 bytes (password-rules.ts);
 *   - not one of the ~49,000 common passwords in the dictionary the zxcvbn-ts project ships
 *     (`@zxcvbn-ts/language-common` 3.0.4, `dictionary.passwords`), compared without case —
 *     OWASP ASVS 4.0.3 V2.1.7 asks that passwords be checked against breached/common lists.
 * The list ships inside the npm package: no network at run time. Must never log a password.
 */
import 'server-only';
import { dictionary } from '@zxcvbn-ts/language-common';
import { refine } from 'zod/mini';
import { passwordLengthSchema } from '../../lib/auth/password-rules';

export const PASSWORD_TOO_COMMON = 'this password is on a list of common passwords; choose one that is not';

let common: Set<string> | undefined;

function commonPasswords(): Set<string> {
  common ??= new Set(dictionary.passwords.map((p) => p.toLowerCase()));
  return common;
}

export function isCommonPassword(password: string): boolean {
  return commonPasswords().has(password.toLowerCase());
}

export const newPasswordSchema = passwordLengthSchema.check(refine((p: string) => !isCommonPassword(p), PASSWORD_TOO_COMMON));
