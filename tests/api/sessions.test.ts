// Sessions end: 12 hours after the last use (idle), 7 days after signing in however busy
// (absolute), and at once on sign-out — and a token that has ended gets nothing from any route,
// Auth.js's own session endpoint included (it used to re-issue a signed-out token's cookie).
// A callbackUrl that is not a page of this site is refused with a 400, not a 500.
import { beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as authRoute from '@/app/api/auth/[...nextauth]/route';
import * as list from '@/app/api/layouts/route';
import { endSessions } from '@/db/accounts';
import { users } from '@/db/schema';
import { SESSION_ABSOLUTE_S } from '@/server/auth/secret';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call, sessionCookie } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';

let db: Db;
let w: World;
beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
});

const nowS = () => Math.floor(Date.now() / 1000);

function setCookies(headers: Headers): string[] {
  return headers.getSetCookie();
}

describe('the absolute session lifetime', () => {
  it('is 7 days', () => {
    expect(SESSION_ABSOLUTE_S).toBe(7 * 24 * 3600);
  });

  it('refuses a token signed in more than 7 days ago, however recently it was re-issued', async () => {
    const old = { ...w.designer, signedInAt: nowS() - SESSION_ABSOLUTE_S - 60 };
    expect((await call(list.GET, { as: old })).status).toBe(401);
    const recent = { ...w.designer, signedInAt: nowS() - SESSION_ABSOLUTE_S + 3600 };
    expect((await call(list.GET, { as: recent })).status).toBe(200);
  });

  it('refuses a token that carries no sign-in time at all', async () => {
    const { encode } = await import('next-auth/jwt');
    const { authSecret, sessionCookieName } = await import('@/server/auth/secret');
    const token = await encode({ token: { uid: w.designer.id, studioId: w.designer.studioId, sv: 0 }, secret: authSecret(), salt: sessionCookieName() });
    expect((await call(list.GET, { headers: { cookie: `${sessionCookieName()}=${token}` } })).status).toBe(401);
  });

  it('the session endpoint ends an over-age token instead of renewing it', async () => {
    const cookie = await sessionCookie({ ...w.designer, signedInAt: nowS() - SESSION_ABSOLUTE_S - 60 });
    const res = await call(authRoute.GET, { path: '/api/auth/session', headers: { cookie } });
    expect(res.status).toBe(200);
    expect(res.body).toBeNull();
    const cleared = setCookies(res.headers).find((c) => c.startsWith('authjs.session-token='));
    expect(cleared).toMatch(/Max-Age=0|Expires=Thu, 01 Jan 1970/i);
  });
});

describe('a signed-out token', () => {
  it('gets no session and no fresh cookie from the session endpoint', async () => {
    const [u] = await db.insert(users).values({ email: 'leaving@sessions.test', name: 'Leaving' }).returning();
    const { memberships } = await import('@/db/schema');
    await db.insert(memberships).values({ userId: u.id, studioId: w.owner.studioId, role: 'designer' });
    const me = { id: u.id, studioId: w.owner.studioId, sessionVersion: 0 };
    const cookie = await sessionCookie(me);
    const live = await call(authRoute.GET, { path: '/api/auth/session', headers: { cookie } });
    expect(live.body?.user?.id).toBe(u.id);
    expect(setCookies(live.headers).some((c) => c.startsWith('authjs.session-token=') && !/Max-Age=0/i.test(c))).toBe(true);

    await endSessions(u.id);
    const after = await call(authRoute.GET, { path: '/api/auth/session', headers: { cookie } });
    expect(after.body).toBeNull();
    const renewed = setCookies(after.headers).filter((c) => c.startsWith('authjs.session-token='));
    expect(renewed.every((c) => /Max-Age=0|Expires=Thu, 01 Jan 1970/i.test(c))).toBe(true);
    expect((await call(list.GET, { headers: { cookie } })).status).toBe(401);
    await db.delete(users).where(eq(users.id, u.id));
  });
});

describe('a callbackUrl that is not a page of this site', () => {
  it.each(['javascript:alert(1)', 'data:text/html,hi', 'not a url at all'])('%s → 400 with a clear message', async (callbackUrl) => {
    const res = await call(authRoute.GET, { path: `/api/auth/signin?callbackUrl=${encodeURIComponent(callbackUrl)}` });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/must be a page of this site/);
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.js|Error:/);
  });

  it('in the callback cookie → 400, and the cookie is cleared', async () => {
    const res = await call(authRoute.GET, { path: '/api/auth/session', headers: { cookie: `authjs.callback-url=${encodeURIComponent('javascript:alert(1)')}` } });
    expect(res.status).toBe(400);
    expect(setCookies(res.headers).some((c) => /^authjs\.callback-url=;.*Max-Age=0/.test(c))).toBe(true);
  });

  it('a path on this site still works', async () => {
    const res = await call(authRoute.GET, { path: `/api/auth/signin?callbackUrl=${encodeURIComponent('/layouts')}` });
    expect(res.status).not.toBe(400);
    expect(res.status).toBeLessThan(500);
  });
});
