// People own their accounts: a studio adds people only by invitation, learns nothing about an
// address until its owner accepts, and never sets anyone's password. The account pre-creation
// attack (invite an unregistered address with a chosen password, remove the membership, keep
// the account) and the "attach an existing account and learn its name" leak are both gone.
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { PEER_HEADER } from '@/server/auth/address';
import { eq } from 'drizzle-orm';
import * as members from '@/app/api/studio/members/route';
import * as invites from '@/app/api/invitations/route';
import * as accept from '@/app/api/invitations/accept/route';
import * as signUpRoute from '@/app/api/sign-up/route';
import { memberships, users } from '@/db/schema';
import { authenticate } from '@/db/accounts';
import { clearAllThrottles } from '@/db/throttle';
import type { Db } from '@/db/client';
import type { FakeSmtp } from '@/dev/fakes/smtp/server';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { linkIn, mailFor, startMailSink } from '../sharing/helpers';

let db: Db;
let w: World;
let smtp: FakeSmtp;
const KIT_PASSWORD = 'kit-own-harbour-password';

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  smtp = await startMailSink();
  // Kit (a client of the foreign studio) has an account with a password of their own.
  const { hashPassword } = await import('@/lib/auth/password');
  await db.update(users).set({ passwordHash: await hashPassword(KIT_PASSWORD) }).where(eq(users.email, 'kit@harbour.test'));
});
afterAll(() => smtp.close());
beforeEach(() => clearAllThrottles());

async function tokenFor(email: string): Promise<string> {
  const [mail] = await mailFor(db, email);
  return linkIn(mail.parsed, '/invite/').pathname.replace('/invite/', '');
}

/** The answer with its ids and dates blanked, to compare two answers' shape and words. */
function shapeOf(body: Record<string, unknown>): unknown {
  return JSON.parse(JSON.stringify(body, (k, v) => (['id', 'email', 'name', 'createdAt', 'expiresAt', 'lastSentAt'].includes(k) ? '…' : v)));
}

describe('adding a member', () => {
  it('answers the same for an address with an account and one without, and creates nothing but an invitation', async () => {
    const usersBefore = (await db.select().from(users)).length;
    const known = await call(members.POST, { method: 'POST', as: w.owner, json: { name: 'Kit', email: 'kit@harbour.test', role: 'designer' } });
    const unknown = await call(members.POST, { method: 'POST', as: w.owner, json: { name: 'Nobody Yet', email: 'nobody-yet@client.test', role: 'designer' } });
    expect(known.status).toBe(201);
    expect(unknown.status).toBe(201);
    expect(shapeOf(known.body)).toEqual(shapeOf(unknown.body));
    // The studio sees what it typed, not the account's name or id.
    expect(JSON.stringify(known.body)).not.toContain('Kit Client');
    expect(JSON.stringify(known.body)).not.toContain(w.foreignClient.id);
    expect(known.body.invitation).toMatchObject({ name: 'Kit', role: 'designer', status: 'pending' });
    expect((await db.select().from(users)).length).toBe(usersBefore);
    expect(await db.select().from(memberships).where(eq(memberships.userId, w.foreignClient.id))).toHaveLength(1);
    const list = await call(members.GET, { as: w.owner });
    expect(JSON.stringify(list.body)).not.toContain('kit@harbour.test');
  });

  it('no longer takes a password from the owner', async () => {
    const res = await call(members.POST, { method: 'POST', as: w.owner, json: { name: 'Victim', email: 'victim@client.test', role: 'client', password: 'owner-chosen-password' } });
    expect(res.status).toBe(400);
    expect(await db.select().from(users).where(eq(users.email, 'victim@client.test'))).toEqual([]);
  });

  it('is the owner’s: designers invite clients only, and clients nobody', async () => {
    const designer = await call(members.POST, { method: 'POST', as: w.designer, json: { name: 'D', email: 'd2@client.test', role: 'designer' } });
    expect(designer.status).toBe(403);
    const client = await call(members.POST, { method: 'POST', as: w.client, json: { name: 'C', email: 'c2@client.test', role: 'client' } });
    expect(client.status).toBe(403);
    const viaInvites = await call(invites.POST, { method: 'POST', as: w.designer, json: { name: 'D', email: 'd3@client.test', role: 'designer' } });
    expect(viaInvites.status).toBe(400);
  });

  it('refuses an address that is already a member of this studio (the studio knows its own people)', async () => {
    const res = await call(members.POST, { method: 'POST', as: w.owner, json: { name: 'Priya', email: 'priya@client.test', role: 'client' } });
    expect(res.status).toBe(409);
  });
});

describe('accepting as an existing account', () => {
  it('needs the invited account’s own session: no session, or another person’s, joins nobody', async () => {
    const token = await tokenFor('kit@harbour.test');
    const anonymous = await call(accept.POST, { method: 'POST', json: { token, password: 'attacker-chosen-password' } });
    expect(anonymous.status).toBe(409);
    expect(anonymous.body.error).toMatch(/Sign in as kit@harbour.test/);
    const stranger = await call(accept.POST, { method: 'POST', as: w.client, json: { token } });
    expect(stranger.status).toBe(409);
    expect(await db.select().from(memberships).where(eq(memberships.userId, w.foreignClient.id))).toHaveLength(1);
    // Kit's password is still Kit's own.
    expect((await authenticate('kit@harbour.test', KIT_PASSWORD, '10.0.0.9')).ok).toBe(true);
    expect((await authenticate('kit@harbour.test', 'attacker-chosen-password', '10.0.0.9')).ok).toBe(false);
  });

  it('joins with the session of the invited account, in the invited role, password untouched; then the studio sees the name', async () => {
    const token = await tokenFor('kit@harbour.test');
    const res = await call(accept.POST, { method: 'POST', as: w.foreignClient, json: { token } });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email: 'kit@harbour.test', studioId: w.owner.studioId, joined: 'existing-account' });
    const [m] = await db.select().from(memberships).where(eq(memberships.studioId, w.owner.studioId)).then((rows) => rows.filter((r) => r.userId === w.foreignClient.id));
    expect(m.role).toBe('designer');
    expect((await authenticate('kit@harbour.test', KIT_PASSWORD, '10.0.0.10')).ok).toBe(true);
    const list = await call(members.GET, { as: w.owner });
    expect(list.body.members).toContainEqual(expect.objectContaining({ name: 'Kit Client', email: 'kit@harbour.test', role: 'designer' }));
  });
});

describe('the pre-created account attack', () => {
  it('leaves no account behind: the real person signs up later with their own password', async () => {
    await call(members.POST, { method: 'POST', as: w.foreignOwner, json: { name: 'Target', email: 'target@client.test', role: 'client' } });
    expect(await db.select().from(users).where(eq(users.email, 'target@client.test'))).toEqual([]);
    const own = await call(signUpRoute.POST, { method: 'POST', json: { name: 'Real Target', email: 'target@client.test', password: 'target-own-choice-pw' }, headers: { [PEER_HEADER]: '10.60.0.1' } });
    expect(own.status).toBe(201);
    // The old invitation link now needs the real person's session.
    const token = await tokenFor('target@client.test');
    expect((await call(accept.POST, { method: 'POST', json: { token, password: 'attacker-pass-123456' } })).status).toBe(409);
  });
});

describe('the people a client sees', () => {
  it('are themselves and their layouts’ workshop, never the studio’s other clients', async () => {
    const res = await call(members.GET, { as: w.client });
    expect(res.status).toBe(200);
    const ids = res.body.members.map((m: { userId: string }) => m.userId);
    expect(ids).toContain(w.client.id);
    expect(ids).toContain(w.owner.id);
    expect(ids).toContain(w.designer.id); // made the client's layout (demo seed)
    expect(ids).not.toContain(w.otherClient.id);
    expect(JSON.stringify(res.body)).not.toContain('Tom');
    expect(res.body.members.every((m: object) => !('email' in m))).toBe(true);
  });
});
