// Client invitations end to end in-process: the workshop invites, the mail arrives at the
// development mail server, the test follows the link in it (parsed with mailparser), the client
// sets a password, joins as a client and sees the shared layout. Every role, bad input, expiry,
// withdrawal, re-sending and a race between two accepts.
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { count, eq } from 'drizzle-orm';
import * as invites from '@/app/api/invitations/route';
import * as oneInvite from '@/app/api/invitations/[id]/route';
import * as resend from '@/app/api/invitations/[id]/resend/route';
import * as accept from '@/app/api/invitations/accept/route';
import * as layoutList from '@/app/api/layouts/route';
import * as layoutRoute from '@/app/api/layouts/[id]/route';
import { invitations, layouts, memberships, users } from '@/db/schema';
import { viewInvitation } from '@/db/sharing/invitations';
import { listClients } from '@/db/sharing/clients';
import { authenticate } from '@/db/accounts';
import type { Db } from '@/db/client';
import type { FakeSmtp } from '@/dev/fakes/smtp/server';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { linkIn, mailFor, startMailSink } from './helpers';
import { clearAllThrottles } from '@/db/throttle';

let db: Db;
let w: World;
let smtp: FakeSmtp;
let stockLayoutId: string;

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  smtp = await startMailSink();
  const [stock] = await db.select({ id: layouts.id }).from(layouts).where(eq(layouts.name, 'Workshop stock — L4H3 empty bay'));
  stockLayoutId = stock.id;
});
afterAll(() => smtp.close());
// Each case starts with full mail budgets (server/mail/budget.ts has its own tests).
beforeEach(() => clearAllThrottles());

const invitationCount = async () => (await db.select({ n: count() }).from(invitations))[0].n;
const PASSWORD = 'long-enough-password';

async function tokenFromLatestMail(email: string): Promise<string> {
  const [mail] = await mailFor(db, email);
  return linkIn(mail.parsed, '/invite/').pathname.replace('/invite/', '');
}

describe('inviting a client', () => {
  it('is for owners and designers: 401 anonymous, 403 clients; nothing stored', async () => {
    const json = { email: 'new@client.test', name: 'New Client' };
    expect((await call(invites.POST, { method: 'POST', as: null, json })).status).toBe(401);
    for (const who of ['client', 'otherClient', 'foreignClient'] as const) {
      expect((await call(invites.POST, { method: 'POST', as: w[who], json })).status, who).toBe(403);
      expect((await call(invites.GET, { as: w[who] })).status, who).toBe(403);
    }
    expect(await invitationCount()).toBe(0);
  });

  it('refuses bad input, members and other studios’ layouts; nothing stored', async () => {
    const cases: [Record<string, unknown>, number, RegExp?][] = [
      [{ email: 'not-an-address', name: 'X' }, 400],
      [{ email: 'a@b.test', name: '' }, 400],
      [{ email: 'a@b.test', name: 'X', layoutId: 'nope' }, 400],
      [{ email: 'a@b.test', name: 'X', role: 'owner' }, 400],
      [{ email: 'a@b.test', name: 'X', layoutId: w.foreignLayoutId }, 400, /this studio’s layouts/],
      [{ email: 'a@b.test', name: 'X', layoutId: w.clientLayoutId }, 409, /already shared/],
      [{ email: 'PRIYA@client.test', name: 'Priya' }, 409, /already belongs to a client/],
    ];
    for (const [json, status, message] of cases) {
      const res = await call(invites.POST, { method: 'POST', as: w.designer, json });
      expect(res.status, JSON.stringify(json)).toBe(status);
      if (message) expect(res.body.error).toMatch(message);
    }
    expect(await invitationCount()).toBe(0);
    expect(await mailFor(db, 'a@b.test')).toEqual([]);
  });

  it('sends the client a mail with a one-time link; only the hash is stored', async () => {
    const res = await call(invites.POST, { method: 'POST', as: w.designer, json: { email: 'Sam@Client.test', name: 'Sam Okafor', layoutId: stockLayoutId } });
    expect(res.status).toBe(201);
    expect(res.body.mail).toBe('sent');
    expect(res.body.invitation).toMatchObject({ email: 'sam@client.test', name: 'Sam Okafor', status: 'pending', layout: { id: stockLayoutId }, invitedBy: 'Ivo Brandt' });
    const [mail] = await mailFor(db, 'sam@client.test');
    expect(mail.parsed.subject).toBe('Saltmarsh Van Works invites you to follow your van\'s design');
    expect(mail.parsed.from?.text).toMatch(/Baywright/);
    const token = await tokenFromLatestMail('sam@client.test');
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(JSON.stringify(await db.select().from(invitations))).not.toContain(token);
    expect(JSON.stringify(res.body)).not.toContain(token);
    expect(await viewInvitation(token)).toMatchObject({ status: 'pending', email: 'sam@client.test', studioName: 'Saltmarsh Van Works', inviterName: 'Ivo Brandt' });
    const listed = await call(invites.GET, { as: w.owner });
    expect(listed.body.invitations.map((i: { email: string }) => i.email)).toEqual(['sam@client.test']);
    expect((await call(invites.GET, { as: w.foreignOwner })).body.invitations).toEqual([]);
  });
});

describe('accepting an invitation', () => {
  it('refuses short passwords and unknown tokens, creating nothing', async () => {
    const token = await tokenFromLatestMail('sam@client.test');
    const short = await call(accept.POST, { method: 'POST', json: { token, password: 'short' } });
    expect(short.status).toBe(400);
    const unknown = await call(accept.POST, { method: 'POST', json: { token: 'A'.repeat(43), password: PASSWORD } });
    expect(unknown.status).toBe(410);
    expect(unknown.body.error).toMatch(/not valid/);
    expect(await db.select().from(users).where(eq(users.email, 'sam@client.test'))).toEqual([]);
  });

  it('creates the account as a client of the studio with the layout shared; the link then works no more', async () => {
    const token = await tokenFromLatestMail('sam@client.test');
    const res = await call(accept.POST, { method: 'POST', json: { token, password: PASSWORD, name: 'Sam Okafor' } });
    expect(res.status).toBe(201);
    expect(res.body).toEqual({ email: 'sam@client.test', layoutId: stockLayoutId, studioId: w.owner.studioId, joined: 'new-account' });
    const [user] = await db.select().from(users).where(eq(users.email, 'sam@client.test'));
    const [m] = await db.select().from(memberships).where(eq(memberships.userId, user.id));
    expect(m).toMatchObject({ studioId: w.owner.studioId, role: 'client' });
    const signedIn = await authenticate('sam@client.test', PASSWORD, 'test');
    expect(signedIn.ok).toBe(true);
    const sam = { id: user.id, studioId: w.owner.studioId, role: 'client' as const };
    const mine = await call(layoutList.GET, { as: sam });
    expect(mine.body.layouts.map((l: { id: string }) => l.id)).toEqual([stockLayoutId]);
    const one = await call(layoutRoute.GET, { params: { id: stockLayoutId }, as: sam });
    expect(one.body.canEdit).toBe(false);
    expect((await call(layoutRoute.GET, { params: { id: w.clientLayoutId }, as: sam })).status).toBe(404);
    const again = await call(accept.POST, { method: 'POST', json: { token, password: PASSWORD } });
    expect(again.status).toBe(410);
    expect(again.body.error).toMatch(/already been used/);
    expect(await viewInvitation(token)).toEqual({ status: 'accepted' });
    const clients = await listClients({ userId: w.designer.id, studioId: w.designer.studioId, role: 'designer', email: 'ivo@saltmarsh.test', name: 'Ivo Brandt' });
    expect(clients.find((c) => c.email === 'sam@client.test')?.layouts.map((l) => l.id)).toEqual([stockLayoutId]);
  });

  it('lets only one of two racing accepts create the account', async () => {
    await call(invites.POST, { method: 'POST', as: w.owner, json: { email: 'race@client.test', name: 'Race' } });
    const token = await tokenFromLatestMail('race@client.test');
    const results = await Promise.all([1, 2].map(() => call(accept.POST, { method: 'POST', json: { token, password: PASSWORD } })));
    expect(results.map((r) => r.status).sort()).toEqual([201, 410]);
    expect(await db.select().from(users).where(eq(users.email, 'race@client.test'))).toHaveLength(1);
  });
});

describe('managing invitations', () => {
  it('re-sends with a new link: the old one stops working, the new one works', async () => {
    const created = await call(invites.POST, { method: 'POST', as: w.designer, json: { email: 'resend@client.test', name: 'Re Send' } });
    const first = await tokenFromLatestMail('resend@client.test');
    expect((await call(resend.POST, { method: 'POST', params: { id: created.body.invitation.id }, as: w.client })).status).toBe(403);
    expect((await call(resend.POST, { method: 'POST', params: { id: created.body.invitation.id }, as: w.foreignOwner })).status).toBe(404);
    const res = await call(resend.POST, { method: 'POST', params: { id: created.body.invitation.id }, as: w.designer });
    expect(res.status).toBe(200);
    expect(res.body.mail).toBe('sent');
    const second = await tokenFromLatestMail('resend@client.test');
    expect(second).not.toBe(first);
    expect(await viewInvitation(first)).toEqual({ status: 'unknown' });
    expect((await viewInvitation(second)).status).toBe('pending');
  });

  it('withdraws an invitation; its link then says so', async () => {
    const created = await call(invites.POST, { method: 'POST', as: w.designer, json: { email: 'withdrawn@client.test', name: 'W' } });
    const token = await tokenFromLatestMail('withdrawn@client.test');
    const params = { id: created.body.invitation.id };
    expect((await call(oneInvite.DELETE, { method: 'DELETE', params, as: w.client })).status).toBe(403);
    expect((await call(oneInvite.DELETE, { method: 'DELETE', params, as: w.foreignOwner })).status).toBe(404);
    expect((await call(oneInvite.DELETE, { method: 'DELETE', params: { id: 'nope' }, as: w.designer })).status).toBe(404);
    const res = await call(oneInvite.DELETE, { method: 'DELETE', params, as: w.designer });
    expect(res.body.invitation.status).toBe('revoked');
    const tried = await call(accept.POST, { method: 'POST', json: { token, password: PASSWORD } });
    expect(tried.status).toBe(410);
    expect(tried.body.error).toMatch(/withdrawn/);
  });

  it('replaces a pending invitation to the same address, and refuses to withdraw an accepted one', async () => {
    await call(invites.POST, { method: 'POST', as: w.designer, json: { email: 'twice@client.test', name: 'Twice' } });
    const first = await tokenFromLatestMail('twice@client.test');
    await call(invites.POST, { method: 'POST', as: w.designer, json: { email: 'twice@client.test', name: 'Twice' } });
    expect(await viewInvitation(first)).toEqual({ status: 'revoked' });
    const accepted = (await call(invites.GET, { as: w.designer })).body.invitations.find((i: { email: string }) => i.email === 'sam@client.test');
    const res = await call(oneInvite.DELETE, { method: 'DELETE', params: { id: accepted.id }, as: w.designer });
    expect(res.status).toBe(409);
  });

  it('lets an invitation expire after a week', async () => {
    const created = await call(invites.POST, { method: 'POST', as: w.designer, json: { email: 'late@client.test', name: 'Late' } });
    const token = await tokenFromLatestMail('late@client.test');
    expect(new Date(created.body.invitation.expiresAt).getTime() - Date.now()).toBeGreaterThan(6.9 * 86_400_000);
    expect((await viewInvitation(token, new Date(Date.now() + 8 * 86_400_000))).status).toBe('expired');
    await db.update(invitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitations.id, created.body.invitation.id));
    const tried = await call(accept.POST, { method: 'POST', json: { token, password: PASSWORD } });
    expect(tried.status).toBe(410);
    expect(tried.body.error).toMatch(/expired/);
  });

  it('keeps the invitation when the mail cannot be sent, and says so', async () => {
    await smtp.close();
    const res = await call(invites.POST, { method: 'POST', as: w.designer, json: { email: 'offline@client.test', name: 'Offline' } });
    smtp = await startMailSink();
    expect(res.status).toBe(201);
    expect(res.body.mail).toBe('not-sent');
    expect(res.body.invitation.lastSentAt).toBeNull();
  });
});
