/**
 * Password hashing: bcrypt at cost 11 (OWASP ASVS 4.0 §2.4.4 asks for a work factor of at least 10).
 * bcrypt reads only the first 72 bytes, so longer passwords are refused rather than silently cut.
 */
import bcrypt from 'bcryptjs';

export { PASSWORD_MIN, PASSWORD_MAX_BYTES } from './password-rules';
const COST = 11;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, COST);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

/** A hash of nothing in particular, compared against when the account does not exist (same timing). */
export const DUMMY_HASH = '$2b$11$h5b0Zq4dybbupXWjshMIU.bQ2relTbObOEVK2a2brG9H9MwHj0oyy';
