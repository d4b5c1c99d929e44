// Mark-ups and the bay's openings: a mark-up can be placed at a window or roof opening by its id
// (the point goes to the opening's middle in plan), an id that is not on the layout is refused with
// 400 and nothing stored, and every thread is listed with the module or opening its point is near.
// Interface behaviour; the one figure (how near is near) is common practice, no source.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { count } from 'drizzle-orm';
import * as threads from '@/app/api/layouts/[id]/comments/route';
import * as oneThread from '@/app/api/layouts/[id]/comments/[commentId]/route';
import * as layoutRoute from '@/app/api/layouts/[id]/route';
import { comments } from '@/db/schema';
import type { Db } from '@/db/client';
import type { FakeSmtp } from '@/dev/fakes/smtp/server';
import { moduleLabel } from '@/lib/layout/kinds';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { as, startMailSink, STRANGERS } from './helpers';

let db: Db;
let w: World;
let smtp: FakeSmtp;
let firstModule: { id: string; label?: string; kind: string; x: number; y: number; length: number; width: number; arrangements: string[] };

const WINDOW = { id: 'galley-win', type: 'window', label: 'Galley window', wall: 'left', position: 600, sillHeight: 950, width: 700, height: 450, opens: true };
const FAN = { id: 'roof-fan', type: 'roof-opening', kind: 'fan', x: 1200, y: 600, length: 400, width: 400, frameHeight: 60 };

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  smtp = await startMailSink();
  const cur = await call(layoutRoute.GET, { params: { id: w.clientLayoutId }, as: w.designer });
  const doc = { ...cur.body.doc, bay: { ...cur.body.doc.bay, openings: [WINDOW, FAN] } };
  firstModule = doc.modules[0];
  const res = await call(layoutRoute.PUT, { method: 'PUT', params: { id: w.clientLayoutId }, as: w.designer, json: { doc }, headers: { 'if-match': String(cur.body.version) } });
  expect(res.status).toBe(200);
});
afterAll(() => smtp.close());

const commentCount = async () => (await db.select({ n: count() }).from(comments))[0].n;
const params = () => ({ id: w.clientLayoutId });

describe('mark-ups at openings', () => {
  it("the client places one at a window: its point is the window's middle on the wall line, and it is listed near it", async () => {
    const res = await call(threads.POST, { method: 'POST', params: params(), as: w.client, json: { arrangement: 'lounge', openingId: 'galley-win', body: 'Could this one open?' } });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    // Glass from 600 to 1300 mm along the left wall: middle x = (600 + 1300) / 2 = 950. In plan the pane
    // is taken as a strip 40 mm into the room from the bare wall line (y 0…40): middle y = 20.
    expect(res.body.thread).toMatchObject({ arrangement: 'lounge', x: 950, y: 20, near: 'Galley window', body: 'Could this one open?' });
    const listed = await call(threads.GET, { params: params(), as: w.designer });
    expect(listed.body.threads.find((t: { id: string }) => t.id === res.body.thread.id).near).toBe('Galley window');
  });

  it('at a roof opening: the middle of its outline', async () => {
    const res = await call(threads.POST, { method: 'POST', params: params(), as: w.designer, json: { arrangement: 'travel', openingId: 'roof-fan', body: 'Fan or plain vent?' } });
    expect(res.status).toBe(201);
    // x 1200 + 400 / 2 = 1400, y 600 + 400 / 2 = 800; an opening wins over a module under it at the same distance.
    expect(res.body.thread).toMatchObject({ x: 1400, y: 800, near: 'Roof fan' });
  });

  it('refuses an opening that is not on the layout with 400 and stores nothing', async () => {
    const before = await commentCount();
    for (const openingId of ['no-such-window', 'rear-window-left-gone']) {
      const res = await call(threads.POST, { method: 'POST', params: params(), as: w.client, json: { arrangement: 'travel', openingId, body: 'Here?' } });
      expect(res.status, openingId).toBe(400);
      expect(res.body.error).toMatch(/opening is not on this layout/);
    }
    for (const json of [
      { arrangement: 'travel', openingId: '../x', body: 'Here?' },
      { arrangement: 'travel', openingId: '', body: 'Here?' },
      { arrangement: 'travel', openingId: 'x'.repeat(65), body: 'Here?' },
      { arrangement: 'travel', openingId: 42, body: 'Here?' },
      { arrangement: 'travel', openingId: 'galley-win', x: 10, y: 10, body: 'both' },
      { openingId: 'galley-win', body: 'no arrangement' },
    ]) {
      expect((await call(threads.POST, { method: 'POST', params: params(), as: w.client, json })).status, JSON.stringify(json)).toBe(400);
    }
    for (const who of STRANGERS) {
      expect((await call(threads.POST, { method: 'POST', params: params(), as: as(w, who), json: { arrangement: 'travel', openingId: 'galley-win', body: 'x' } })).status, who).toBe(404);
    }
    expect(await commentCount()).toBe(before);
  });

  it('a free point is listed near the nearest module; one far from everything near nothing', async () => {
    const arrangement = firstModule.arrangements[0];
    // The middle of the first module: inside its outline (distance 0).
    const x = Math.round(firstModule.x + firstModule.length / 2);
    const y = Math.round(firstModule.y + firstModule.width / 2);
    const near = await call(threads.POST, { method: 'POST', params: params(), as: w.designer, json: { arrangement, x, y, body: 'This one' } });
    expect(near.status).toBe(201);
    expect(near.body.thread.near).toBe(moduleLabel(firstModule as Parameters<typeof moduleLabel>[0]));
    // 450 mm in front of the cab end (x = −450 is allowed, 500 mm margin) and 450 mm outside the left
    // wall: at least √(450² + 450²) ≈ 636 mm from anything in the bay, beyond the 600 mm limit.
    const far = await call(threads.POST, { method: 'POST', params: params(), as: w.designer, json: { arrangement, x: -450, y: -450, body: 'Out in the cab' } });
    expect(far.status).toBe(201);
    expect(far.body.thread.near).toBeNull();
    // Settling returns the thread with the same name.
    const settled = await call(oneThread.PATCH, { method: 'PATCH', params: { id: w.clientLayoutId, commentId: near.body.thread.id }, as: w.client, json: { settled: true } });
    expect(settled.status).toBe(200);
    expect(settled.body.thread.near).toBe(near.body.thread.near);
  });
});
