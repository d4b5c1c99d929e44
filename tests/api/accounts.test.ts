// Sign-up, sign-in, wrong password, the failed-sign-in limit and sign-out ending sessions.
import { beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as signUpRoute from '@/app/api/sign-up/route';
import * as list from '@/app/api/layouts/route';
import { authenticate, endSessions } from '@/db/accounts';
import { memberships, users } from '@/db/schema';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call, sessionCookie } from '../helpers/http';
import { decodeCached, type SessionClaims } from '@/server/auth/token-cache';
import { PEER_HEADER } from '@/server/auth/address';

let db: Db;
beforeAll(async () => {
  db = await useFreshDb();
});

describe('sign-up', () => {
  it('creates a user, a studio of their own and makes them its owner, storing only a bcrypt hash', async () => {
    const res = await call(signUpRoute.POST, { method: 'POST', json: { name: 'Sam Okafor', email: 'Sam@SelfBuild.test', password: 'a-long-enough-password' } });
    expect(res.status).toBe(201);
    expect(res.body).toEqual({ id: expect.any(String), email: 'sam@selfbuild.test', name: 'Sam Okafor' });
    const [user] = await db.select().from(users).where(eq(users.id, res.body.id));
    // bcrypt, cost 11 (OWASP ASVS 4.0 §2.4.4: work factor ≥ 10)
    expect(user.passwordHash).toMatch(/^\$2[aby]\$11\$/);
    const [m] = await db.select().from(memberships).where(eq(memberships.userId, user.id));
    expect(m.role).toBe('owner');
  });

  it('refuses a second account on the same address, whatever its case', async () => {
    const res = await call(signUpRoute.POST, { method: 'POST', json: { name: 'Sam Again', email: 'SAM@selfbuild.test', password: 'another-long-password' } });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(/already exists/);
  });

  it.each([
    [{ name: 'A', email: 'a@b.test', password: 'short' }, 'password', /12 characters/],
    [{ name: 'A', email: 'not-an-address', password: 'a-long-enough-password' }, 'email', /e-mail/],
    [{ name: '', email: 'a@b.test', password: 'a-long-enough-password' }, 'name', /name/],
    [{ name: 'A', email: 'a@b.test', password: 'ü'.repeat(40) }, 'password', /72 bytes/],
  ])('rejects %j with a field message', async (json, path, message) => {
    const res = await call(signUpRoute.POST, { method: 'POST', json });
    expect(res.status).toBe(400);
    expect(res.body.issues).toContainEqual({ path, message: expect.stringMatching(message) });
  });
});

describe('sign-in', () => {
  it('accepts the right password and names the studio and role', async () => {
    const result = await authenticate('sam@selfbuild.test', 'a-long-enough-password', '10.0.0.1');
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.user.role).toBe('owner');
  });

  it('refuses a wrong password and an unknown account alike', async () => {
    expect(await authenticate('sam@selfbuild.test', 'wrong-password-here', '10.0.0.1')).toEqual({ ok: false, reason: 'invalid' });
    expect(await authenticate('nobody@selfbuild.test', 'whatever-password', '10.0.0.1')).toEqual({ ok: false, reason: 'invalid' });
  });
  // Throttling: tests/api/sign-in-throttle.test.ts (OWASP ASVS 4.0.3 V2.2.1).
});

describe('sign-out', () => {
  it('ends every session: an old cookie no longer opens the API', async () => {
    const result = await authenticate('sam@selfbuild.test', 'a-long-enough-password', '10.5.5.5');
    if (!result.ok) throw new Error('sign-in failed');
    const as = { id: result.user.id, studioId: result.user.studioId, sessionVersion: result.user.sessionVersion };
    expect((await call(list.GET, { as })).status).toBe(200);
    await endSessions(result.user.id);
    expect((await call(list.GET, { as })).status).toBe(401);
  });
});

describe('the decoded-session cache', () => {
  it('does not outlive sign-out or a removed membership: the same cookie text is refused at once', async () => {
    const result = await authenticate('sam@selfbuild.test', 'a-long-enough-password', '10.5.5.6');
    if (!result.ok) throw new Error('sign-in failed');
    const user = { id: result.user.id, studioId: result.user.studioId, sessionVersion: result.user.sessionVersion };
    const cookie = await sessionCookie(user);
    expect((await call(list.GET, { headers: { cookie } })).status).toBe(200);
    expect((await call(list.GET, { headers: { cookie } })).status).toBe(200); // served from the cache
    await db.delete(memberships).where(eq(memberships.userId, user.id));
    expect((await call(list.GET, { headers: { cookie } })).status).toBe(401);
  });

  it('refuses a token whose text was changed, even when the original is cached', async () => {
    const made = await call(signUpRoute.POST, { method: 'POST', json: { name: 'Tamper Test', email: 'tamper@selfbuild.test', password: 'tamper-long-password' }, headers: { [PEER_HEADER]: '10.9.9.8' } });
    const [{ u, m }] = await db.select({ u: users, m: memberships }).from(users).innerJoin(memberships, eq(memberships.userId, users.id)).where(eq(users.id, made.body.id));
    const cookie = await sessionCookie({ id: u.id, studioId: m.studioId, sessionVersion: u.sessionVersion });
    expect((await call(list.GET, { headers: { cookie } })).status).toBe(200);
    const last = cookie.at(-2) === 'A' ? 'B' : 'A';
    const tampered = `${cookie.slice(0, -2)}${last}${cookie.at(-1)}`;
    expect((await call(list.GET, { headers: { cookie: tampered } })).status).toBe(401);
  });

  it('decodes a token once, then answers from memory until the token expires', async () => {
    let decodes = 0;
    const decode = async (): Promise<SessionClaims> => {
      decodes++;
      return { uid: 'u1', exp: 2_000 };
    };
    expect(await decodeCached('token-a', decode, 1_000_000)).toEqual({ uid: 'u1', exp: 2_000 });
    expect(await decodeCached('token-a', decode, 1_500_000)).toEqual({ uid: 'u1', exp: 2_000 });
    expect(decodes).toBe(1);
    expect(await decodeCached('token-a', decode, 2_000_001)).toBeNull(); // past exp (seconds)
    expect(await decodeCached('token-b', async () => null)).toBeNull();
  });
});
