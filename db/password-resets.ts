/**
 * Password reset by e-mail. A link carries a one-time token (256 bits, lib tokens), stored only
 * as its SHA-256 hash, good for 30 minutes and for one use (OWASP Forgot Password Cheat Sheet:
 * random, single use, short expiry, stored hashed — secondary citation). Asking for a new link
 * retires the older ones. Using a link sets the new password and ends every session of the
 * account, the one asking included.
 * Must never tell a caller whether an address has an account, and never return a token except
 * to the code that mails it.
 */
import 'server-only';
import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import { getDb } from './client';
import { memberships, passwordResets, users } from './schema';
import { normaliseEmail } from './accounts';
import { hashToken, isTokenShaped, newToken } from './sharing/tokens';
import { hashPassword } from '../lib/auth/password';

export const RESET_MINUTES = 30;

export interface IssuedReset {
  token: string;
  email: string;
  name: string;
  /** The person's first studio: the development outbox files the mail under it. */
  studioId: string | null;
  expiresAt: Date;
}

/** A new reset link for the address, or null when no account uses it (the caller says nothing of that). */
export async function issuePasswordReset(emailInput: string, now = new Date()): Promise<IssuedReset | null> {
  const db = await getDb();
  const email = normaliseEmail(emailInput);
  const [user] = await db.select({ id: users.id, email: users.email, name: users.name }).from(users).where(eq(sql`lower(${users.email})`, email)).limit(1);
  if (!user) return null;
  const [m] = await db.select({ studioId: memberships.studioId }).from(memberships).where(eq(memberships.userId, user.id)).orderBy(memberships.createdAt).limit(1);
  const token = newToken();
  const expiresAt = new Date(now.getTime() + RESET_MINUTES * 60_000);
  await db.transaction(async (tx) => {
    await tx.update(passwordResets).set({ usedAt: now }).where(and(eq(passwordResets.userId, user.id), isNull(passwordResets.usedAt)));
    await tx.insert(passwordResets).values({ userId: user.id, tokenHash: hashToken(token), createdAt: now, expiresAt });
  });
  return { token, email: user.email, name: user.name, studioId: m?.studioId ?? null, expiresAt };
}

export class ResetLinkUnusableError extends Error {
  readonly status = 410;
  constructor() {
    super('This reset link has expired or has already been used. Ask for a new one from the sign-in page.');
  }
}

/** True while the link can still be used (for the page, before the person types a password). */
export async function resetLinkUsable(token: string, now = new Date()): Promise<boolean> {
  if (!isTokenShaped(token)) return false;
  const db = await getDb();
  const [row] = await db
    .select({ id: passwordResets.id })
    .from(passwordResets)
    .where(and(eq(passwordResets.tokenHash, hashToken(token)), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, now)))
    .limit(1);
  return Boolean(row);
}

/**
 * Sets the new password (already checked against the password rule) and ends every session.
 * The link is claimed in the same statement that checks it, so two racing uses cannot both work.
 */
export async function resetPassword(token: string, newPassword: string, now = new Date()): Promise<{ email: string }> {
  if (!isTokenShaped(token)) throw new ResetLinkUnusableError();
  const passwordHash = await hashPassword(newPassword);
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [claimed] = await tx
      .update(passwordResets)
      .set({ usedAt: now })
      .where(and(eq(passwordResets.tokenHash, hashToken(token)), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, now)))
      .returning({ userId: passwordResets.userId });
    if (!claimed) throw new ResetLinkUnusableError();
    await tx.update(passwordResets).set({ usedAt: now }).where(and(eq(passwordResets.userId, claimed.userId), isNull(passwordResets.usedAt)));
    const [user] = await tx
      .update(users)
      .set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1` })
      .where(eq(users.id, claimed.userId))
      .returning({ email: users.email });
    return { email: user.email };
  });
}
