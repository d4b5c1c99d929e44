/**
 * Accounts: sign-up (a user and a studio of their own), password sign-in with rate limiting,
 * sign-out. Returns DTOs only; never a password hash.
 */
import 'server-only';
import { isUniqueViolation } from './sharing/pg-errors';
import { and, count, eq, gt, sql } from 'drizzle-orm';
import { getDb } from './client';
import { memberships, signInFailures, studios, users } from './schema';
import { ConflictError } from './errors';
import { DUMMY_HASH, hashPassword, verifyPassword } from '../lib/auth/password';
import type { StudioRole } from './actor';

export interface UserDto {
  id: string;
  email: string;
  name: string;
}

export interface SignedInUser extends UserDto {
  studioId: string;
  role: StudioRole;
  sessionVersion: number;
}

/** Failed sign-ins allowed per account, and per address, in the window (OWASP ASVS 4.0 §2.2.1). */
export const SIGN_IN_FAILURE_LIMIT = 10;
export const SIGN_IN_WINDOW_MS = 15 * 60 * 1000;

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

export async function signUp(input: { email: string; name: string; password: string; studioName?: string }): Promise<SignedInUser> {
  const db = await getDb();
  const email = normaliseEmail(input.email);
  const passwordHash = await hashPassword(input.password);
  // Two sign-ups of one address at once both pass the check; the unique index stops the second.
  return db.transaction(async (tx) => {
    const existing = await tx.select({ id: users.id }).from(users).where(eq(sql`lower(${users.email})`, email)).limit(1);
    if (existing.length) throw new ConflictError('An account with this e-mail address already exists.');
    const [user] = await tx.insert(users).values({ email, name: input.name.trim(), passwordHash }).returning();
    const [studio] = await tx.insert(studios).values({ name: input.studioName?.trim() || `${input.name.trim()}’s studio` }).returning();
    await tx.insert(memberships).values({ userId: user.id, studioId: studio.id, role: 'owner' });
    return { id: user.id, email: user.email, name: user.name, studioId: studio.id, role: 'owner' as const, sessionVersion: user.sessionVersion };
  }).catch((err: unknown) => {
    if (isUniqueViolation(err, 'users_email_unique')) throw new ConflictError('An account with this e-mail address already exists.');
    throw err;
  });
}

export type SignInResult = { ok: true; user: SignedInUser } | { ok: false; reason: 'invalid' | 'rate_limited' };

export async function authenticate(emailInput: string, password: string, address: string): Promise<SignInResult> {
  const db = await getDb();
  const email = normaliseEmail(emailInput);
  const since = new Date(Date.now() - SIGN_IN_WINDOW_MS);
  const [[byEmail], [byAddress]] = await Promise.all([
    db.select({ n: count() }).from(signInFailures).where(and(eq(signInFailures.email, email), gt(signInFailures.at, since))),
    db.select({ n: count() }).from(signInFailures).where(and(eq(signInFailures.address, address), gt(signInFailures.at, since))),
  ]);
  if (byEmail.n >= SIGN_IN_FAILURE_LIMIT || byAddress.n >= SIGN_IN_FAILURE_LIMIT) return { ok: false, reason: 'rate_limited' };

  const [user] = await db.select().from(users).where(eq(sql`lower(${users.email})`, email)).limit(1);
  const good = await verifyPassword(password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !user.passwordHash || !good) {
    await db.insert(signInFailures).values({ email, address });
    return { ok: false, reason: 'invalid' };
  }
  const [m] = await db
    .select({ studioId: memberships.studioId, role: memberships.role })
    .from(memberships)
    .where(eq(memberships.userId, user.id))
    .orderBy(memberships.createdAt)
    .limit(1);
  if (!m) return { ok: false, reason: 'invalid' };
  await db.delete(signInFailures).where(eq(signInFailures.email, email));
  return { ok: true, user: { id: user.id, email: user.email, name: user.name, studioId: m.studioId, role: m.role, sessionVersion: user.sessionVersion } };
}

/** Ends every session of the user: tokens carrying the old session version are refused. */
export async function endSessions(userId: string): Promise<void> {
  const db = await getDb();
  await db.update(users).set({ sessionVersion: sql`${users.sessionVersion} + 1` }).where(eq(users.id, userId));
}
