// Mail budgets: nobody who signs up can make the app mail an address over and over. Counted in
// the database per person (40 an hour), per studio (150 an hour) and, for invitations and
// resends, per studio and address (3 a day); server/mail/budget.ts. Other mail-sending actions
// (comments, revisions, decisions, quotes) keep their change and report the mail as not sent.
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { count, eq } from 'drizzle-orm';
import * as invites from '@/app/api/invitations/route';
import * as resend from '@/app/api/invitations/[id]/resend/route';
import * as members from '@/app/api/studio/members/route';
import * as comments from '@/app/api/layouts/[id]/comments/route';
import { invitations, outboxMail } from '@/db/schema';
import { clearAllThrottles } from '@/db/throttle';
import { MAIL_BUDGETS, takeMailBudget } from '@/server/mail/budget';
import type { Db } from '@/db/client';
import type { FakeSmtp } from '@/dev/fakes/smtp/server';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { mailFor, startMailSink } from '../sharing/helpers';

let db: Db;
let w: World;
let smtp: FakeSmtp;
beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  smtp = await startMailSink();
});
afterAll(() => smtp.close());
beforeEach(() => clearAllThrottles());

const mailCount = async () => (await db.select({ n: count() }).from(outboxMail))[0].n;

describe('invitations and resends', () => {
  it('mail one address from one studio at most three times a day, then 429 with Retry-After and nothing stored', async () => {
    const json = { email: 'again@budget.test', name: 'Again' };
    const first = await call(invites.POST, { method: 'POST', as: w.designer, json });
    expect(first.status).toBe(201);
    expect((await call(resend.POST, { method: 'POST', as: w.designer, params: { id: first.body.invitation.id } })).status).toBe(200);
    expect((await call(members.POST, { method: 'POST', as: w.owner, json: { ...json, role: 'client' } })).status).toBe(201);
    const fourth = await call(invites.POST, { method: 'POST', as: w.owner, json });
    expect(fourth.status).toBe(429);
    expect(fourth.body.error).toMatch(/three invitations from this studio today/);
    expect(Number(fourth.headers.get('retry-after'))).toBeGreaterThan(3600);
    const fifth = await call(resend.POST, { method: 'POST', as: w.owner, params: { id: first.body.invitation.id } });
    expect(fifth.status).toBe(429);
    expect(await mailFor(db, 'again@budget.test')).toHaveLength(3);
    expect((await db.select().from(invitations).where(eq(invitations.email, 'again@budget.test'))).length).toBe(2);
  });

  it(`stop one person after ${MAIL_BUDGETS.person.free} mails an hour, whatever the addresses`, async () => {
    for (let i = 0; i < MAIL_BUDGETS.person.free; i++) await takeMailBudget({ userId: w.designer.id, studioId: w.designer.studioId });
    const before = await mailCount();
    const res = await call(invites.POST, { method: 'POST', as: w.designer, json: { email: 'one-more@budget.test', name: 'One More' } });
    expect(res.status).toBe(429);
    expect(res.body.error).toMatch(/You have sent a lot of mail/);
    expect(await mailCount()).toBe(before);
    // Another person of the same studio still has their own budget.
    expect((await call(invites.POST, { method: 'POST', as: w.owner, json: { email: 'one-more@budget.test', name: 'One More' } })).status).toBe(201);
  });

  it(`stop a studio after ${MAIL_BUDGETS.studio.free} mails an hour, whoever sends them`, async () => {
    for (let i = 0; i < MAIL_BUDGETS.studio.free; i++) await takeMailBudget({ userId: `someone-${i % 5}`, studioId: w.owner.studioId });
    const res = await call(invites.POST, { method: 'POST', as: w.owner, json: { email: 'studio-cap@budget.test', name: 'Cap' } });
    expect(res.status).toBe(429);
    expect(res.body.error).toMatch(/This studio has sent a lot of mail/);
    // Another studio is not affected.
    expect((await call(invites.POST, { method: 'POST', as: w.foreignOwner, json: { email: 'studio-cap@budget.test', name: 'Cap' } })).status).toBe(201);
  });
});

describe('mail that comes with another change', () => {
  it('keeps the comment and says the mail was not sent once the budget is spent', async () => {
    const pin = { arrangement: 'lounge', x: 500, y: 400, body: 'Can the fridge move aft?' };
    const ok = await call(comments.POST, { method: 'POST', as: w.client, params: { id: w.clientLayoutId }, json: pin });
    expect(ok.status).toBe(201);
    expect(ok.body.mail).toBe('sent');
    // Spend the rest of the client's hour (the first comment already used some of it).
    await expect(async () => {
      for (let i = 0; i <= MAIL_BUDGETS.person.free; i++) await takeMailBudget({ userId: w.client.id, studioId: w.client.studioId });
    }).rejects.toThrow(/a lot of mail/);
    const before = await mailCount();
    const held = await call(comments.POST, { method: 'POST', as: w.client, params: { id: w.clientLayoutId }, json: { ...pin, body: 'And the water tank?' } });
    expect(held.status).toBe(201);
    expect(held.body.mail).toBe('not-sent');
    expect(await mailCount()).toBe(before);
  });
});
