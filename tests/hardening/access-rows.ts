/**
 * The rows of the access-control matrix: for each route and method, a request that would succeed
 * for someone entitled to it, and the status each kind of caller must get.
 */
import type { CallOptions } from '../helpers/http';
import type { World } from '../helpers/world';
import type { Db } from '@/db/client';
import { starterLayout } from '@/lib/layout/templates';
import { TYPICAL_BRIEF } from '@/lib/proposals/brief';
import { SHARING_ROWS } from '../sharing/access-rows';
import { FILE_ROWS } from './file-rows';
import { PLANNING_ROWS } from '../planning-api/access-rows';
import { MANAGE_ROWS } from './manage-rows';

export const WHO = ['anonymous', 'viewer', 'foreignClient', 'otherClient', 'client', 'designer', 'owner', 'foreignOwner'] as const;
export type Who = (typeof WHO)[number];
export interface Fixture {
  world: World;
  db: Db;
}
export interface Row {
  route: string;
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  request: (fx: Fixture, who: Who) => CallOptions | Promise<CallOptions>;
  expect: Record<Who, number | number[]>;
}

const NOBODY = { anonymous: 401, viewer: 401 } as const;
/** Readable by the studio's staff and the layout's own client; unknown to everyone else. */
const LAYOUT_READ = { ...NOBODY, foreignClient: 404, otherClient: 404, client: 200, designer: 200, owner: 200, foreignOwner: 404 };
/** Writable by the studio's staff; the client may read but not write; unknown to others. */
const LAYOUT_WRITE = { ...NOBODY, foreignClient: 404, otherClient: 404, client: 403, designer: 200, owner: 200, foreignOwner: 404 };
/** Any signed-in member. */
const MEMBER = { ...NOBODY, foreignClient: 200, otherClient: 200, client: 200, designer: 200, owner: 200, foreignOwner: 200 };

async function freshLayout(fx: Fixture, name: string): Promise<string> {
  const { createLayout } = await import('@/db/layouts');
  const { designer } = fx.world;
  const actor = { userId: designer.id, studioId: designer.studioId, role: 'designer' as const, email: '', name: '' };
  const layout = await createLayout(actor, { name, doc: starterLayout('starter-l-lounge')!, clientId: fx.world.client.id });
  return layout.id;
}

async function versionOf(fx: Fixture, id: string): Promise<number> {
  const { eq } = await import('drizzle-orm');
  const { layouts } = await import('@/db/schema');
  const [row] = await fx.db.select({ version: layouts.version }).from(layouts).where(eq(layouts.id, id));
  return row.version;
}

let memberSeq = 0;

const CORE_ROWS: Row[] = [
  // Readiness for a load balancer: open to anyone, says nothing about any studio.
  {
    route: '/api/health', method: 'GET', request: () => ({}),
    expect: { anonymous: 200, viewer: 200, foreignClient: 200, otherClient: 200, client: 200, designer: 200, owner: 200, foreignOwner: 200 },
  },
  { route: '/api/layouts', method: 'GET', request: () => ({}), expect: MEMBER },
  {
    route: '/api/layouts', method: 'POST',
    request: () => ({ json: { name: 'Matrix van', bayTemplateId: 'l2h2' } }),
    expect: { ...NOBODY, foreignClient: 403, otherClient: 403, client: 403, designer: 201, owner: 201, foreignOwner: 201 },
  },
  { route: '/api/layouts/[id]', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId } }), expect: LAYOUT_READ },
  {
    route: '/api/layouts/[id]', method: 'PUT',
    request: async (fx) => {
      const id = fx.world.clientLayoutId;
      return { params: { id }, headers: { 'if-match': String(await versionOf(fx, id)) }, json: { doc: starterLayout('starter-l-lounge') } };
    },
    expect: LAYOUT_WRITE,
  },
  {
    route: '/api/layouts/[id]', method: 'DELETE',
    request: async (fx) => ({ params: { id: await freshLayout(fx, 'Matrix delete') } }),
    expect: { ...LAYOUT_WRITE, designer: 204, owner: 204 },
  },
  {
    route: '/api/layouts/[id]/archive', method: 'POST',
    request: async (fx) => ({ params: { id: await freshLayout(fx, 'Matrix archive') } }),
    expect: LAYOUT_WRITE,
  },
  {
    route: '/api/layouts/[id]/archive', method: 'DELETE',
    request: async (fx) => ({ params: { id: await freshLayout(fx, 'Matrix restore') } }),
    expect: LAYOUT_WRITE,
  },
  { route: '/api/layouts/[id]/checks', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId } }), expect: LAYOUT_READ },
  { route: '/api/checks', method: 'POST', request: () => ({ json: starterLayout('starter-l-lounge') }), expect: MEMBER },
  // Proposals are the workshop's work: owners and designers of any studio; clients refused.
  {
    // A small bay, so the row tests who may ask, not how long a long bay takes on a loaded machine.
    route: '/api/proposals', method: 'POST', request: () => ({ json: { ...TYPICAL_BRIEF, bay: { source: 'template', template: 'l1h1' }, standing: null } }),
    expect: { ...NOBODY, foreignClient: 403, otherClient: 403, client: 403, designer: 200, owner: 200, foreignOwner: 200 },
  },
  {
    route: '/api/sign-up', method: 'POST',
    request: () => ({ json: { name: 'Matrix Person', email: `matrix${memberSeq++}@selfbuild.test`, password: 'matrix-long-password' } }),
    expect: { anonymous: 201, viewer: 201, foreignClient: 201, otherClient: 201, client: 201, designer: 201, owner: 201, foreignOwner: 201 },
  },
  { route: '/api/studio', method: 'GET', request: () => ({}), expect: MEMBER },
  {
    route: '/api/studio', method: 'PATCH',
    request: () => ({ json: { units: 'mm' } }),
    expect: { ...NOBODY, foreignClient: 403, otherClient: 403, client: 403, designer: 403, owner: 200, foreignOwner: 200 },
  },
  { route: '/api/studio/members', method: 'GET', request: () => ({}), expect: MEMBER },
  {
    route: '/api/studio/members', method: 'POST',
    request: () => ({ json: { name: 'Matrix Member', email: `member${memberSeq++}@client.test`, role: 'client' } }),
    expect: { ...NOBODY, foreignClient: 403, otherClient: 403, client: 403, designer: 403, owner: 201, foreignOwner: 201 },
  },
  {
    route: '/api/studio/members/[userId]', method: 'PATCH',
    request: (fx) => ({ params: { userId: fx.world.otherClient.id }, json: { role: 'client' } }),
    expect: { ...NOBODY, foreignClient: 403, otherClient: 403, client: 403, designer: 403, owner: 200, foreignOwner: 404 },
  },
  {
    route: '/api/studio/members/[userId]', method: 'DELETE',
    request: async (fx, who) => {
      // Each cell removes its own newly added member, so one caller's success cannot hide another's refusal.
      // (A fixture: the app itself only adds people by invitation.)
      const { memberships, users } = await import('@/db/schema');
      const [u] = await fx.db.insert(users).values({ name: `Leaver ${who}`, email: `leaver-${who}-${memberSeq++}@client.test` }).returning({ id: users.id });
      await fx.db.insert(memberships).values({ userId: u.id, studioId: fx.world.owner.studioId, role: 'client' });
      return { params: { userId: u.id } };
    },
    expect: { ...NOBODY, foreignClient: 403, otherClient: 403, client: 403, designer: 403, owner: 204, foreignOwner: 404 },
  },
  // Changing one's own password: any signed-in person; a wrong current password is a 400 (the
  // session's own password is left alone here so later rows keep their sessions).
  {
    route: '/api/account/password', method: 'POST',
    request: () => ({ json: { currentPassword: 'not-the-current-one', newPassword: 'matrix-new-long-password' } }),
    expect: { ...NOBODY, foreignClient: 400, otherClient: 400, client: 400, designer: 400, owner: 400, foreignOwner: 400 },
  },
  // Asking for a reset link: open to anyone, the same answer for every address.
  {
    route: '/api/password-reset', method: 'POST',
    request: (_fx, who) => ({ json: { email: `reset-${who}@selfbuild.test` }, headers: { 'x-forwarded-for': `10.99.${memberSeq++ % 250}.1` } }),
    expect: { anonymous: 202, viewer: 202, foreignClient: 202, otherClient: 202, client: 202, designer: 202, owner: 202, foreignOwner: 202 },
  },
  // Using a reset link: the token is the proof, whoever holds it (each cell a throwaway account).
  {
    route: '/api/password-reset/confirm', method: 'POST',
    request: async (fx, who) => {
      const { users } = await import('@/db/schema');
      const { issuePasswordReset } = await import('@/db/password-resets');
      const email = `resetter-${who}-${memberSeq++}@selfbuild.test`;
      await fx.db.insert(users).values({ name: 'Resetter', email });
      const issued = await issuePasswordReset(email);
      return { json: { token: issued!.token, password: 'matrix-reset-long-password' } };
    },
    expect: { anonymous: 200, viewer: 200, foreignClient: 200, otherClient: 200, client: 200, designer: 200, owner: 200, foreignOwner: 200 },
  },
];

export const ROWS: Row[] = [...CORE_ROWS, ...SHARING_ROWS, ...PLANNING_ROWS, ...FILE_ROWS, ...MANAGE_ROWS];
