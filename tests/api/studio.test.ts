// Studio settings and members, as each role.
import { beforeAll, describe, expect, it } from 'vitest';
import * as studio from '@/app/api/studio/route';
import * as members from '@/app/api/studio/members/route';
import * as member from '@/app/api/studio/members/[userId]/route';
import type { Db } from '@/db/client';
import { memberships, users } from '@/db/schema';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';

let w: World;
let db: Db;
beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
});

describe('members', () => {
  it('lists members with addresses for staff and names only for clients', async () => {
    const staff = await call(members.GET, { as: w.designer });
    expect(staff.status).toBe(200);
    expect(staff.body.members.map((m: { email: string }) => m.email)).toContain('priya@client.test');
    const client = await call(members.GET, { as: w.client });
    expect(client.body.members.every((m: object) => !('email' in m))).toBe(true);
    expect(JSON.stringify(client.body)).not.toContain('Harbour');
    expect((await call(members.GET, { as: null })).status).toBe(401);
  });

  it('lets only the owner invite a member; nobody joins until they accept', async () => {
    const body = { name: 'Ada Client', email: 'ada@client.test', role: 'client' };
    expect((await call(members.POST, { method: 'POST', as: w.designer, json: body })).status).toBe(403);
    expect((await call(members.POST, { method: 'POST', as: w.client, json: body })).status).toBe(403);
    const ok = await call(members.POST, { method: 'POST', as: w.owner, json: body });
    expect(ok.status).toBe(201);
    expect(ok.body.invitation).toMatchObject({ name: 'Ada Client', role: 'client', email: 'ada@client.test', status: 'pending' });
    const list = await call(members.GET, { as: w.owner });
    expect(list.body.members.map((m: { email: string }) => m.email)).not.toContain('ada@client.test');
  });

  it('lets the owner change a role, not their own, and not in another studio', async () => {
    expect((await call(member.PATCH, { method: 'PATCH', as: w.owner, params: { userId: w.otherClient.id }, json: { role: 'designer' } })).status).toBe(200);
    expect((await call(member.PATCH, { method: 'PATCH', as: w.owner, params: { userId: w.owner.id }, json: { role: 'client' } })).status).toBe(400);
    expect((await call(member.PATCH, { method: 'PATCH', as: w.foreignOwner, params: { userId: w.otherClient.id }, json: { role: 'owner' } })).status).toBe(404);
    expect((await call(member.PATCH, { method: 'PATCH', as: w.designer, params: { userId: w.otherClient.id }, json: { role: 'owner' } })).status).toBe(403);
    expect((await call(member.PATCH, { method: 'PATCH', as: w.owner, params: { userId: 'x' }, json: { role: 'owner' } })).status).toBe(404);
    expect((await call(member.PATCH, { method: 'PATCH', as: w.owner, params: { userId: w.otherClient.id }, json: { role: 'admin' } })).status).toBe(400);
    expect((await call(member.PATCH, { method: 'PATCH', as: w.owner, params: { userId: w.otherClient.id }, json: { role: 'client' } })).status).toBe(200);
  });

  it('removes a member only for the owner', async () => {
    // A fixture member (the app adds people only by invitation, tested in people-own-accounts).
    const [temp] = await db.insert(users).values({ name: 'Temp', email: 'temp@client.test' }).returning({ id: users.id });
    await db.insert(memberships).values({ userId: temp.id, studioId: w.owner.studioId, role: 'client' });
    expect((await call(member.DELETE, { method: 'DELETE', as: w.designer, params: { userId: temp.id } })).status).toBe(403);
    expect((await call(member.DELETE, { method: 'DELETE', as: w.owner, params: { userId: temp.id } })).status).toBe(204);
    expect((await call(member.DELETE, { method: 'DELETE', as: w.owner, params: { userId: temp.id } })).status).toBe(404);
  });
});

describe('studio settings', () => {
  it('lets every member read and only the owner change them', async () => {
    expect((await call(studio.GET, { as: w.client })).body.name).toBe('Saltmarsh Van Works');
    const change = { units: 'cm', checkDefaults: { walkwayMin: 500, mattressRegion: 'eu' } };
    expect((await call(studio.PATCH, { method: 'PATCH', as: w.designer, json: change })).status).toBe(403);
    const ok = await call(studio.PATCH, { method: 'PATCH', as: w.owner, json: change });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ units: 'cm', checkDefaults: { walkwayMin: 500, mattressRegion: 'eu' } });
    expect((await call(studio.PATCH, { method: 'PATCH', as: w.owner, json: { units: 'furlong' } })).status).toBe(400);
    expect((await call(studio.PATCH, { method: 'PATCH', as: w.owner, json: { checkDefaults: { walkwayMin: 12.5 } } })).status).toBe(400);
  });
});
