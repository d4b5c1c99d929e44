/**
 * Accounts: sign-up (a user and a studio of their own), password sign-in with throttling,
 * changing a password, sign-out. Returns DTOs only; never a password hash.
 */
import 'server-only';
import { isUniqueViolation } from './sharing/pg-errors';
import { eq, sql } from 'drizzle-orm';
import { getDb } from './client';
import { memberships, studios, users } from './schema';
import { clearKey, refund, reserve, throttleKey, type ThrottleRule } from './throttle';
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

/**
 * Sign-in throttling, OWASP ASVS 4.0.3 V2.2.1 (anti-automation: "ever increasing delays between
 * attempts", "IP address restrictions", and "no more than 100 failed attempts per hour is
 * possible on a single account"). Every attempt is counted in the database before the password
 * is compared (db/throttle.ts), under three keys:
 *   - the account from this client address: 10 free attempts, then waits of 1 s, 2 s, 4 s … up
 *     to 15 min; a success clears it. A burst from one address therefore never touches the
 *     owner signing in from another address.
 *   - the client address over all accounts (password spraying): 50 free, then the same waits.
 *   - the account over all addresses: 90 free, then waits from 1 min doubling to 15 min, which
 *     keeps an account under 100 failures an hour. Only a guesser using many addresses can
 *     reach it; that is the trade-off ASVS asks for.
 * Each counter starts afresh after an hour without attempts. Numbers: common practice within
 * the ASVS bounds, no source for the exact values.
 */
export const SIGN_IN_FAILURE_LIMIT = 10;
const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
export const SIGN_IN_RULES = {
  accountAtAddress: { free: SIGN_IN_FAILURE_LIMIT, baseMs: 1000, capMs: 15 * MINUTE, quietMs: HOUR },
  address: { free: 50, baseMs: 1000, capMs: 15 * MINUTE, quietMs: HOUR },
  account: { free: 90, baseMs: MINUTE, capMs: 15 * MINUTE, quietMs: HOUR },
} satisfies Record<string, ThrottleRule>;

function signInKeys(email: string, address: string): { key: string; rule: ThrottleRule }[] {
  return [
    { key: throttleKey('signin-address', address), rule: SIGN_IN_RULES.address },
    { key: throttleKey('signin-account-address', email, address), rule: SIGN_IN_RULES.accountAtAddress },
    { key: throttleKey('signin-account', email), rule: SIGN_IN_RULES.account },
  ];
}

/**
 * Reserves one password comparison for this account from this address, or says how long to
 * wait. On refusal nothing stays counted.
 */
async function reserveComparison(email: string, address: string): Promise<{ ok: true; settle: (good: boolean) => Promise<void> } | { ok: false; retryAfterS: number }> {
  const keys = signInKeys(email, address);
  const taken: string[] = [];
  for (const { key, rule } of keys) {
    const r = await reserve(key, rule);
    if (!r.ok) {
      await Promise.all(taken.map(refund));
      return { ok: false, retryAfterS: r.retryAfterS };
    }
    taken.push(key);
  }
  return {
    ok: true,
    async settle(good) {
      if (!good) return; // a failure stays counted under every key
      const [addressKey, accountAddressKey, accountKey] = keys.map((k) => k.key);
      await Promise.all([refund(addressKey), clearKey(accountAddressKey), refund(accountKey)]);
    },
  };
}

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

export type SignInResult = { ok: true; user: SignedInUser } | { ok: false; reason: 'invalid' } | { ok: false; reason: 'rate_limited'; retryAfterS: number };

export async function authenticate(emailInput: string, password: string, address: string): Promise<SignInResult> {
  const db = await getDb();
  const email = normaliseEmail(emailInput);
  const slot = await reserveComparison(email, address);
  if (!slot.ok) return { ok: false, reason: 'rate_limited', retryAfterS: slot.retryAfterS };

  const [user] = await db.select().from(users).where(eq(sql`lower(${users.email})`, email)).limit(1);
  const good = await verifyPassword(password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !user.passwordHash || !good) {
    await slot.settle(false);
    return { ok: false, reason: 'invalid' };
  }
  const [m] = await db
    .select({ studioId: memberships.studioId, role: memberships.role })
    .from(memberships)
    .where(eq(memberships.userId, user.id))
    .orderBy(memberships.createdAt)
    .limit(1);
  await slot.settle(true);
  if (!m) return { ok: false, reason: 'invalid' };
  return { ok: true, user: { id: user.id, email: user.email, name: user.name, studioId: m.studioId, role: m.role, sessionVersion: user.sessionVersion } };
}

/**
 * Changes the signed-in person's password: the current one is asked for (and throttled like a
 * sign-in, so a borrowed session cannot guess it), then every session ends, this one included;
 * the form signs in again with the new password.
 */
export async function changePassword(
  userId: string,
  input: { currentPassword: string; newPassword: string },
  address: string,
): Promise<{ ok: true } | { ok: false; reason: 'wrong_password' } | { ok: false; reason: 'rate_limited'; retryAfterS: number }> {
  const db = await getDb();
  const [user] = await db.select().from(users).where(eq(users.id, userId)).limit(1);
  if (!user) return { ok: false, reason: 'wrong_password' };
  const email = normaliseEmail(user.email);
  const slot = await reserveComparison(email, address);
  if (!slot.ok) return { ok: false, reason: 'rate_limited', retryAfterS: slot.retryAfterS };
  const good = user.passwordHash ? await verifyPassword(input.currentPassword, user.passwordHash) : false;
  await slot.settle(good);
  if (!good) return { ok: false, reason: 'wrong_password' };
  const passwordHash = await hashPassword(input.newPassword);
  await db
    .update(users)
    .set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(eq(users.id, userId));
  return { ok: true };
}

/** Ends every session of the user: tokens carrying the old session version are refused. */
export async function endSessions(userId: string): Promise<void> {
  const db = await getDb();
  await db.update(users).set({ sessionVersion: sql`${users.sessionVersion} + 1` }).where(eq(users.id, userId));
}
