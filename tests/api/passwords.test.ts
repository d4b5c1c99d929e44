// Changing and resetting a password, and the one password rule (at least 12 characters, not on
// the common-password list of @zxcvbn-ts/language-common; OWASP ASVS 4.0.3 V2.1.1 and V2.1.7)
// on every path that sets one: sign-up, accepting an invitation, change, reset.
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { PEER_HEADER } from '@/server/auth/address';
import { eq } from 'drizzle-orm';
import * as signUpRoute from '@/app/api/sign-up/route';
import * as changeRoute from '@/app/api/account/password/route';
import * as resetRequest from '@/app/api/password-reset/route';
import * as resetConfirm from '@/app/api/password-reset/confirm/route';
import * as accept from '@/app/api/invitations/accept/route';
import * as invites from '@/app/api/invitations/route';
import * as list from '@/app/api/layouts/route';
import { authenticate } from '@/db/accounts';
import { clearAllThrottles } from '@/db/throttle';
import { passwordResets, users } from '@/db/schema';
import { resetPassword } from '@/db/password-resets';
import { settledResetMail } from '@/server/mail/password-reset';
import { PASSWORD_TOO_COMMON } from '@/server/auth/password-policy';
import type { Db } from '@/db/client';
import type { FakeSmtp } from '@/dev/fakes/smtp/server';
import { useFreshDb } from '../helpers/db';
import { call, type SessionUser } from '../helpers/http';
import { linkIn, mailFor, startMailSink } from '../sharing/helpers';

let db: Db;
let smtp: FakeSmtp;
let ana: SessionUser;
const FIRST = 'ana-first-long-password';

beforeAll(async () => {
  db = await useFreshDb();
  smtp = await startMailSink();
  const res = await call(signUpRoute.POST, { method: 'POST', json: { name: 'Ana Pereira', email: 'ana@pw.test', password: FIRST }, headers: { [PEER_HEADER]: '10.70.0.1' } });
  expect(res.status).toBe(201);
  const signed = await authenticate('ana@pw.test', FIRST, '10.70.0.1');
  if (!signed.ok) throw new Error('sign-in failed');
  ana = { id: signed.user.id, studioId: signed.user.studioId, sessionVersion: signed.user.sessionVersion };
});
afterAll(() => smtp.close());
beforeEach(() => clearAllThrottles());

async function sessionVersion(id: string): Promise<number> {
  return (await db.select({ sv: users.sessionVersion }).from(users).where(eq(users.id, id)))[0].sv;
}

describe('the password rule', () => {
  // Both are 12 characters or more and appear in the zxcvbn-ts common-password dictionary.
  const COMMON = ['1qaz2wsx3edc', 'QWERTY123456'];

  it.each(COMMON)('refuses the common password %s at sign-up with a clear message', async (password) => {
    const res = await call(signUpRoute.POST, { method: 'POST', json: { name: 'C', email: `c-${password}@pw.test`, password }, headers: { [PEER_HEADER]: '10.70.0.2' } });
    expect(res.status).toBe(400);
    expect(res.body.issues).toContainEqual({ path: 'password', message: PASSWORD_TOO_COMMON });
  });

  it('refuses it when accepting an invitation, changing and resetting too', async () => {
    const accepted = await call(accept.POST, { method: 'POST', json: { token: 'A'.repeat(43), password: COMMON[0] } });
    expect(accepted.status).toBe(400);
    expect(accepted.body.issues).toContainEqual({ path: 'password', message: PASSWORD_TOO_COMMON });
    const changed = await call(changeRoute.POST, { method: 'POST', as: ana, json: { currentPassword: FIRST, newPassword: COMMON[0] } });
    expect(changed.status).toBe(400);
    expect(changed.body.issues).toContainEqual({ path: 'newPassword', message: PASSWORD_TOO_COMMON });
    const reset = await call(resetConfirm.POST, { method: 'POST', json: { token: 'A'.repeat(43), password: COMMON[0] } });
    expect(reset.status).toBe(400);
    expect(reset.body.issues).toContainEqual({ path: 'password', message: PASSWORD_TOO_COMMON });
  });

  it('asks for 12 characters everywhere', async () => {
    const res = await call(resetConfirm.POST, { method: 'POST', json: { token: 'A'.repeat(43), password: 'eleven-char' } });
    expect(res.body.issues).toContainEqual({ path: 'password', message: 'use at least 12 characters' });
  });
});

describe('changing a password', () => {
  it('needs a session', async () => {
    expect((await call(changeRoute.POST, { method: 'POST', json: { currentPassword: FIRST, newPassword: 'whatever-new-password' } })).status).toBe(401);
  });

  it('asks the current password and changes nothing when it is wrong', async () => {
    const res = await call(changeRoute.POST, { method: 'POST', as: ana, json: { currentPassword: 'not-my-password', newPassword: 'ana-second-long-password' } });
    expect(res.status).toBe(400);
    expect(res.body.issues).toContainEqual({ path: 'currentPassword', message: 'that is not your current password' });
    expect((await authenticate('ana@pw.test', FIRST, '10.70.0.3')).ok).toBe(true);
  });

  it('throttles guesses at the current password like sign-ins', async () => {
    // The clock stands still, so the 1 s wait the tenth failure earns has not run out when the
    // eleventh try comes, however slowly a loaded machine hashes the ten guesses.
    vi.useFakeTimers({ toFake: ['Date'] });
    try {
      for (let i = 0; i < 10; i++) await call(changeRoute.POST, { method: 'POST', as: ana, json: { currentPassword: `guess-${i}`, newPassword: 'ana-second-long-password' }, headers: { [PEER_HEADER]: '10.70.9.9' } });
      const res = await call(changeRoute.POST, { method: 'POST', as: ana, json: { currentPassword: FIRST, newPassword: 'ana-second-long-password' }, headers: { [PEER_HEADER]: '10.70.9.9' } });
      expect(res.status).toBe(429);
      expect(Number(res.headers.get('retry-after'))).toBeGreaterThanOrEqual(1);
    } finally {
      vi.useRealTimers();
    }
  });

  it('sets the new password and ends every session, this one included', async () => {
    const res = await call(changeRoute.POST, { method: 'POST', as: ana, json: { currentPassword: FIRST, newPassword: 'ana-second-long-password' } });
    expect(res.status).toBe(200);
    expect((await call(list.GET, { as: ana })).status).toBe(401);
    expect((await authenticate('ana@pw.test', FIRST, '10.70.0.4')).ok).toBe(false);
    const again = await authenticate('ana@pw.test', 'ana-second-long-password', '10.70.0.4');
    expect(again.ok).toBe(true);
    ana = { ...ana, sessionVersion: await sessionVersion(ana.id) };
    expect((await call(list.GET, { as: ana })).status).toBe(200);
  });
});

describe('resetting a password by mail', () => {
  it('answers a known and an unknown address identically, and mails only the known one', async () => {
    const known = await call(resetRequest.POST, { method: 'POST', json: { email: 'ANA@pw.test' } });
    const unknown = await call(resetRequest.POST, { method: 'POST', json: { email: 'nobody@pw.test' } });
    await settledResetMail();
    expect(known.status).toBe(202);
    expect({ status: unknown.status, body: unknown.body }).toEqual({ status: known.status, body: known.body });
    expect([...known.headers.keys()].sort()).toEqual([...unknown.headers.keys()].sort());
    expect(await mailFor(db, 'nobody@pw.test')).toEqual([]);
    const [mail] = await mailFor(db, 'ana@pw.test');
    expect(mail.parsed.subject).toBe('Set a new Baywright password');
    expect(mail.parsed.text).toMatch(/within 30 minutes/);
  });

  it('stores only the hash; the link sets the password once and ends every session', async () => {
    const [mail] = await mailFor(db, 'ana@pw.test');
    const token = linkIn(mail.parsed, '/reset-password/').pathname.replace('/reset-password/', '');
    expect(JSON.stringify(await db.select().from(passwordResets))).not.toContain(token);
    expect((await call(list.GET, { as: ana })).status).toBe(200);
    const res = await call(resetConfirm.POST, { method: 'POST', json: { token, password: 'ana-third-long-password' } });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ email: 'ana@pw.test' });
    expect((await call(list.GET, { as: ana })).status).toBe(401);
    expect((await authenticate('ana@pw.test', 'ana-third-long-password', '10.70.0.5')).ok).toBe(true);
    const again = await call(resetConfirm.POST, { method: 'POST', json: { token, password: 'ana-fourth-long-password' } });
    expect(again.status).toBe(410);
    expect(again.body.error).toMatch(/expired or has already been used/);
    ana = { ...ana, sessionVersion: await sessionVersion(ana.id) };
  });

  it('retires an older link when a new one is asked for, and a link expires after 30 minutes', async () => {
    await call(resetRequest.POST, { method: 'POST', json: { email: 'ana@pw.test' } });
    await settledResetMail();
    const older = linkIn((await mailFor(db, 'ana@pw.test'))[0].parsed, '/reset-password/').pathname.split('/').pop()!;
    await call(resetRequest.POST, { method: 'POST', json: { email: 'ana@pw.test' } });
    await settledResetMail();
    const newer = linkIn((await mailFor(db, 'ana@pw.test'))[0].parsed, '/reset-password/').pathname.split('/').pop()!;
    expect(newer).not.toBe(older);
    expect((await call(resetConfirm.POST, { method: 'POST', json: { token: older, password: 'ana-fifth-long-password' } })).status).toBe(410);
    await expect(resetPassword(newer, 'ana-fifth-long-password', new Date(Date.now() + 31 * 60_000))).rejects.toMatchObject({ status: 410 });
  });

  it('mails one address at most three links an hour, and still answers the same', async () => {
    const before = (await mailFor(db, 'ana@pw.test')).length;
    const answers = [];
    for (let i = 0; i < 5; i++) answers.push(await call(resetRequest.POST, { method: 'POST', json: { email: 'ana@pw.test' }, headers: { [PEER_HEADER]: `10.71.0.${i}` } }));
    await settledResetMail();
    expect(new Set(answers.map((a) => a.status))).toEqual(new Set([202]));
    expect((await mailFor(db, 'ana@pw.test')).length - before).toBe(3);
  });

  it('limits requests from one client address', async () => {
    let last = 0;
    for (let i = 0; i < 11; i++) last = (await call(resetRequest.POST, { method: 'POST', json: { email: `x${i}@pw.test` }, headers: { [PEER_HEADER]: '10.72.0.1' } })).status;
    await settledResetMail();
    expect(last).toBe(429);
  });
});

describe('an invitation needs no owner-set password either', () => {
  it('the invited person sets their own with the rule applied', async () => {
    const res = await call(invites.POST, { method: 'POST', as: ana, json: { email: 'newbie@pw.test', name: 'Newbie' } });
    expect(res.status).toBe(201);
    const token = linkIn((await mailFor(db, 'newbie@pw.test'))[0].parsed, '/invite/').pathname.split('/').pop()!;
    const noPassword = await call(accept.POST, { method: 'POST', json: { token } });
    expect(noPassword.status).toBe(400);
    expect(noPassword.body.error).toMatch(/Choose a password/);
    expect((await call(accept.POST, { method: 'POST', json: { token, password: 'newbie-own-password' } })).status).toBe(201);
  });
});
