/**
 * The access-control matrix. It finds every route handler under app/api by itself, so a route
 * (or a method) without a row here fails the test, then calls each method as anonymous, a
 * viewer-link holder, a client of another studio, another client of the same studio, the layout's client, a designer, the owner and
 * the owner of another studio, asserting the status and that no other studio's data is in any body.
 */
import os from 'node:os';
import fs from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call, type CallOptions, type SessionUser } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { ROWS, WHO, type Who, type Fixture } from './access-rows';
import { discoverRoutes } from './discover-routes';

const METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;
/** Auth.js's own endpoints: tested through sign-in, not by role. */
const OUT_OF_SCOPE = new Set(['/api/auth/[...nextauth]']);

function discoverServerActions(): string[] {
  const files: string[] = [];
  const walk = (dir: string) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      const p = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(p);
      else if (/\.(ts|tsx)$/.test(entry.name) && /^\s*['"]use server['"]/m.test(fs.readFileSync(p, 'utf8'))) files.push(p);
    }
  };
  for (const d of ['app', 'components', 'lib']) walk(path.join(process.cwd(), d));
  return files;
}

const routes = discoverRoutes();
let db: Db;
let w: World;
let fx: Fixture;
/** The name of the layout every layout row asks about: another client of the studio must never see it. */
let clientLayoutName: string;

beforeAll(async () => {
  // Uploaded files of these tests go to a folder of their own.
  process.env.BAYWRIGHT_DATA_ROOT = fs.mkdtempSync(path.join(os.tmpdir(), 'baywright-matrix-'));
  db = await useFreshDb();
  w = await buildWorld(db);
  fx = { world: w, db };
  const { eq } = await import('drizzle-orm');
  const { layouts } = await import('@/db/schema');
  [{ name: clientLayoutName }] = await db.select({ name: layouts.name }).from(layouts).where(eq(layouts.id, w.clientLayoutId));
});

const FOREIGN_MARKERS = ['Harbour secret plan', 'olu@harbour.test', 'kit@harbour.test', 'Harbour Campers'];

function identity(who: Who): SessionUser | null {
  switch (who) {
    case 'anonymous':
    case 'viewer':
      return null;
    case 'foreignClient':
      return w.foreignClient;
    case 'otherClient':
      return w.otherClient;
    case 'client':
      return w.client;
    case 'designer':
      return w.designer;
    case 'owner':
      return w.owner;
    case 'foreignOwner':
      return w.foreignOwner;
  }
}

describe('every route has a row', () => {
  it('finds the route handlers', () => {
    expect(routes.length).toBeGreaterThan(5);
  });

  it.each(routes.filter((r) => !OUT_OF_SCOPE.has(r.route)))('$route: each exported method is in the matrix', async ({ route, file }) => {
    const mod = await import(/* @vite-ignore */ file);
    const exported = METHODS.filter((m) => typeof mod[m] === 'function');
    expect(exported.length).toBeGreaterThan(0);
    for (const method of exported) {
      expect(ROWS.find((r) => r.route === route && r.method === method), `no matrix row for ${method} ${route}`).toBeDefined();
    }
  });

  it('has no server actions outside the matrix (all writes go through route handlers)', () => {
    expect(discoverServerActions()).toEqual([]);
  });
});

describe.each(ROWS.map((r) => [`${r.method} ${r.route}`, r] as const))('%s', (_name, row) => {
  it.each(WHO)('as %s', async (who) => {
    const file = routes.find((r) => r.route === row.route)?.file;
    expect(file, `route ${row.route} exists`).toBeDefined();
    const mod = await import(/* @vite-ignore */ file!);
    const request: CallOptions = await row.request(fx, who);
    const res = await call(mod[row.method], { method: row.method, ...request, as: identity(who) });
    const expected = row.expect[who];
    expect(Array.isArray(expected) ? expected : [expected], `${row.method} ${row.route} as ${who}: ${JSON.stringify(res.body)?.slice(0, 200)}`).toContain(res.status);
    expect(res.status).toBeLessThan(500);
    if (!who.startsWith('foreign')) {
      const text = JSON.stringify(res.body ?? '');
      for (const marker of FOREIGN_MARKERS) expect(text).not.toContain(marker);
    }
    if (who === 'otherClient') expect(JSON.stringify(res.body ?? '')).not.toContain(clientLayoutName);
  });
});
