// The check routes: a posted document and a stored layout, each with the rights of the caller.
import { beforeAll, describe, expect, it } from 'vitest';
import * as posted from '@/app/api/checks/route';
import * as stored from '@/app/api/layouts/[id]/checks/route';
import * as studio from '@/app/api/studio/route';
import { starterLayout } from '@/lib/layout/templates';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';

let db: Db;
let w: World;
beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
});

describe('POST /api/checks', () => {
  it('returns a report for a posted layout: every finding with measured, required, unit, message and source', async () => {
    const res = await call(posted.POST, { method: 'POST', as: w.designer, json: starterLayout('starter-l-lounge') });
    expect(res.status).toBe(200);
    expect(res.body.ok).toBe(true);
    const sleep = res.body.findings.find((f: { id: string }) => f.id === 'sleep.length');
    expect(sleep).toMatchObject({ status: 'pass', arrangement: 'sleep', unit: 'mm', measured: 2000, source: expect.any(String) });
    for (const f of res.body.findings) {
      expect(f.message.length).toBeGreaterThan(10);
      expect(f.source).toMatch(/\w{3}/);
    }
  });

  it('reports a failing layout as not ok, naming the modules', async () => {
    const doc = starterLayout('starter-l-lounge')!;
    const clash = { ...doc, modules: [...doc.modules, { ...doc.modules.find((m) => m.id === 'sink')!, id: 'sink-copy' }] };
    const res = await call(posted.POST, { method: 'POST', as: w.client, json: clash });
    expect(res.status).toBe(200);
    expect(res.body.ok).toBe(false);
    expect(res.body.findings).toContainEqual(expect.objectContaining({ id: 'fit.overlap', status: 'fail', moduleIds: expect.arrayContaining(['sink', 'sink-copy']) }));
  });

  it('answers a bad document with 400 and field paths, and anonymous callers with 401', async () => {
    const doc = { ...starterLayout('starter-l-lounge')!, bay: { length: -3 } };
    const res = await call(posted.POST, { method: 'POST', as: w.designer, json: doc });
    expect(res.status).toBe(400);
    expect(res.body.issues.map((i: { path: string }) => i.path)).toContain('bay.length');
    expect((await call(posted.POST, { method: 'POST', as: null, json: starterLayout('starter-l-lounge') })).status).toBe(401);
  });

  it('applies the studio’s check defaults under the layout’s own settings', async () => {
    await call(studio.PATCH, { method: 'PATCH', as: w.owner, json: { checkDefaults: { walkwayMin: 700 } } });
    const doc = starterLayout('starter-l-lounge')!;
    const strict = await call(posted.POST, { method: 'POST', as: w.designer, json: { ...doc, settings: {} } });
    const find = (body: { findings: { id: string; arrangement?: string }[] }, id: string) => body.findings.find((f) => f.id === id && f.arrangement === 'lounge') as unknown as { status: string; required: number };
    // walkway.width warns below the minimum + 100 mm (common practice): 700 + 100 with the studio's default.
    expect(find(strict.body, 'walkway.width').required).toBe(800);
    expect(find(strict.body, 'walkway.reach').status).toBe('fail');
    const own = await call(posted.POST, { method: 'POST', as: w.designer, json: { ...doc, settings: { walkwayMin: 450 } } });
    expect(find(own.body, 'walkway.reach').status).toBe('pass');
    expect(find(own.body, 'walkway.width').required).toBe(550);
    await call(studio.PATCH, { method: 'PATCH', as: w.owner, json: { checkDefaults: {} } });
  });

  it('rate-limits one user (429 with a retry hint) without affecting another', async () => {
    const body = starterLayout('starter-rear-bed');
    const statuses: number[] = [];
    for (let i = 0; i < 80; i++) statuses.push((await call(posted.POST, { method: 'POST', as: w.otherClient, json: body })).status);
    expect(statuses).toContain(429);
    expect(statuses.slice(0, 10).every((s) => s === 200)).toBe(true);
    const limited = await call(posted.POST, { method: 'POST', as: w.otherClient, json: body });
    if (limited.status === 429) expect(limited.body.retryAfter).toBeGreaterThan(0);
    expect((await call(posted.POST, { method: 'POST', as: w.foreignOwner, json: body })).status).toBe(200);
  });
});

describe('GET /api/layouts/:id/checks', () => {
  it('reports on the stored layout for the staff and its client', async () => {
    for (const who of [w.owner, w.designer, w.client]) {
      const res = await call(stored.GET, { as: who, params: { id: w.clientLayoutId } });
      expect(res.status).toBe(200);
      expect(res.body.findings.length).toBeGreaterThan(5);
      expect(res.headers.get('etag')).toMatch(/^"\d+"$/);
    }
  });

  it('is not found for another client, another studio or a nonsense id', async () => {
    expect((await call(stored.GET, { as: w.otherClient, params: { id: w.clientLayoutId } })).status).toBe(404);
    expect((await call(stored.GET, { as: w.foreignOwner, params: { id: w.clientLayoutId } })).status).toBe(404);
    expect((await call(stored.GET, { as: w.owner, params: { id: 'nope' } })).status).toBe(404);
    expect((await call(stored.GET, { as: null, params: { id: w.clientLayoutId } })).status).toBe(401);
  });
});
