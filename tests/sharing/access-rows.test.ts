// Runs the sharing rows of the access matrix here too, so they are proven before the hardening
// matrix takes them in: every sharing route × every kind of caller gets exactly its status.
import { beforeAll, describe, expect, it } from 'vitest';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call, type SessionUser } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { SHARING_ROWS } from './access-rows';

const ROUTES: Record<string, () => Promise<Record<string, unknown>>> = {
  '/api/layouts/[id]/revisions': () => import('@/app/api/layouts/[id]/revisions/route'),
  '/api/layouts/[id]/revisions/[revisionId]': () => import('@/app/api/layouts/[id]/revisions/[revisionId]/route'),
  '/api/layouts/[id]/revisions/[revisionId]/decision': () => import('@/app/api/layouts/[id]/revisions/[revisionId]/decision/route'),
  '/api/layouts/[id]/revisions/compare': () => import('@/app/api/layouts/[id]/revisions/compare/route'),
  '/api/layouts/[id]/revisions/standing': () => import('@/app/api/layouts/[id]/revisions/standing/route'),
  '/api/layouts/[id]/links': () => import('@/app/api/layouts/[id]/links/route'),
  '/api/layouts/[id]/links/[linkId]': () => import('@/app/api/layouts/[id]/links/[linkId]/route'),
  '/api/layouts/[id]/comments': () => import('@/app/api/layouts/[id]/comments/route'),
  '/api/layouts/[id]/comments/[commentId]': () => import('@/app/api/layouts/[id]/comments/[commentId]/route'),
  '/api/invitations': () => import('@/app/api/invitations/route'),
  '/api/invitations/[id]': () => import('@/app/api/invitations/[id]/route'),
  '/api/invitations/[id]/resend': () => import('@/app/api/invitations/[id]/resend/route'),
  '/api/invitations/accept': () => import('@/app/api/invitations/accept/route'),
  '/api/v/[token]': () => import('@/app/api/v/[token]/route'),
  '/api/v/[token]/checks': () => import('@/app/api/v/[token]/checks/route'),
  '/api/v/[token]/version': () => import('@/app/api/v/[token]/version/route'),
  '/outbox/[id]/raw': () => import('@/app/(app)/outbox/[id]/raw/route'),
};
const WHO = ['anonymous', 'viewer', 'foreignClient', 'client', 'designer', 'owner', 'foreignOwner'] as const;

let db: Db;
let w: World;
beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
});

function identity(who: (typeof WHO)[number]): SessionUser | null {
  return who === 'anonymous' || who === 'viewer' ? null : w[who];
}

it('has a row for every method of every sharing route, and a route for every row', async () => {
  for (const [route, load] of Object.entries(ROUTES)) {
    const methods = Object.keys(await load()).filter((k) => /^(GET|POST|PUT|PATCH|DELETE)$/.test(k));
    for (const m of methods) expect(SHARING_ROWS.some((r) => r.route === route && r.method === m), `${m} ${route}`).toBe(true);
  }
  for (const r of SHARING_ROWS) expect(ROUTES[r.route], r.route).toBeDefined();
});

describe.each(SHARING_ROWS.map((r) => [`${r.method} ${r.route}`, r] as const))('%s', (_name, row) => {
  it.each(WHO)('as %s', async (who) => {
    const handler = (await ROUTES[row.route]())[row.method] as Parameters<typeof call>[0];
    const res = await call(handler, { method: row.method, ...(await row.request({ world: w, db }, who)), as: identity(who) });
    const want = row.expect[who];
    expect(Array.isArray(want) ? want : [want], JSON.stringify(res.body)?.slice(0, 200)).toContain(res.status);
    expect(JSON.stringify(res.body ?? '')).not.toMatch(/Harbour secret plan|olu@harbour\.test|kit@harbour\.test|\$2b\$/);
  });
});
