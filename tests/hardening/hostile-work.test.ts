/**
 * Hostile layouts through every route that runs checks, draws a plan sheet or compares revisions:
 * all modules on one spot, 5,000 modules, 5,000 modules overlapping in sleep, the most build-up
 * layers, the most doors and arches (tests/hardening/fixtures/adversarial-layouts.ts). Every answer
 * is bounded:
 * - it is a real answer: 200 (a sheet whose bay fits no paper: 422 with the reason), never the
 *   503 the work pool gives when a job runs past its time limit or a worker dies at its 512 MB
 *   heap cap (BAYWRIGHT_WORKER_HEAP_MB) — so a strict status is also the workers' heap check;
 * - JSON answers and PDFs are under 2 MB, and this process's heap stays under 512 MB (hard
 *   limits). The print view's page carries its SVG markup about 2.35 times (the HTML, then the
 *   server components' payload that hydrates it, its quotes escaped): measured on 2026-12-04 by
 *   `npm run bench:hostile` as 3,990 KB of page for 1,733 KB of markup, 2,623 for 1,126 and
 *   1,977 for 833. So the markup must stay under 2 MB ÷ 2.4 for the page to stay under 2 MB;
 * - it comes within 12 s. The goal is 2 s (`npm run bench:hostile` measures it against the
 *   production server); the limit here is six times that because this shared two-core machine
 *   runs other suites beside this one, and it is still far below the minutes an unbounded rule
 *   took. Before the overlap rule was bounded, the first layout ran the process out of heap through
 *   every one of these routes; before the sheet was bounded, its PDF took 10 s and its SVG 8 MB.
 */
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import * as checksRoute from '@/app/api/checks/route';
import * as layoutChecks from '@/app/api/layouts/[id]/checks/route';
import * as sheetRoute from '@/app/api/layouts/[id]/sheet/route';
import * as compareRoute from '@/app/api/layouts/[id]/revisions/compare/route';
import * as revisionsRoute from '@/app/api/layouts/[id]/revisions/route';
import * as linksRoute from '@/app/api/layouts/[id]/links/route';
import * as viewerChecks from '@/app/api/v/[token]/checks/route';
import { sheetRequestFor } from '@/server/sheet/sheet-request';
import { SheetSvg } from '@/components/sheet/SheetSvg';
import { loadActor } from '@/db/actor';
import { layouts } from '@/db/schema';
import type { Db } from '@/db/client';
import { closeWorkPool, runJob, WorkPoolBusyError } from '@/lib/workers/pool';
import type { LayoutDoc } from '@/lib/layout';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { ADVERSARIAL_LAYOUTS } from './fixtures/adversarial-layouts';

/** Six times the 2 s goal: see the header. */
const LIMIT_MS = 12_000;
const LIMIT_BYTES = 2 * 1024 * 1024;
const LIMIT_HEAP = 512 * 1024 * 1024;

let db: Db;
let w: World;

interface Stored {
  name: string;
  doc: LayoutDoc;
  id: string;
  token: string;
}
const stored: Stored[] = [];

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  for (const { name, make } of ADVERSARIAL_LAYOUTS) {
    const doc = make();
    const [row] = await db.insert(layouts).values({ studioId: w.owner.studioId, clientId: w.client.id, name: doc.name, doc }).returning({ id: layouts.id });
    const rev = await call(revisionsRoute.POST, { method: 'POST', params: { id: row.id }, json: { note: 'hostile' }, as: w.designer });
    expect(rev.status, `issue revision of ${name}`).toBe(201);
    const link = await call(linksRoute.POST, { method: 'POST', params: { id: row.id }, json: {}, as: w.designer });
    expect(link.status, `viewer link of ${name}`).toBe(201);
    stored.push({ name, doc, id: row.id, token: String(link.body.path).split('/').pop()! });
  }
  // The pool's workers are up before any clock runs (from source they compile TypeScript first).
  const tiny = { ...ADVERSARIAL_LAYOUTS[0].make(), modules: [] };
  for (let i = 0; i < 3; i++) if (await runJob('checks', { doc: tiny }).then(() => true, () => false)) break;
}, 300_000);

afterAll(async () => {
  await closeWorkPool();
});

beforeEach(() => {
  sheetRoute.sheetLimiter.clear();
  sheetRoute.sheetAddressLimiter.clear();
});

/** The print view's markup: the page that carries it about 2.35 times must stay under 2 MB. */
const LIMIT_PRINT_MARKUP = LIMIT_BYTES / 2.4;

async function timed(what: string, run: () => Promise<{ status: number; bytes: number }>, statuses: number[] = [200], limitBytes = LIMIT_BYTES) {
  const t0 = performance.now();
  const { status, bytes } = await run();
  const ms = performance.now() - t0;
  expect(statuses, `${what}: status ${status}`).toContain(status);
  expect(bytes, `${what}: ${bytes} bytes`).toBeLessThan(limitBytes);
  expect(process.memoryUsage().heapUsed, `${what}: heap`).toBeLessThan(LIMIT_HEAP);
  expect(ms, `${what}: ${ms.toFixed(0)} ms`).toBeLessThan(LIMIT_MS);
}

async function viaRoute(handler: Parameters<typeof call>[0], options: Parameters<typeof call>[1]) {
  const res = await call(handler, options);
  return { status: res.status, bytes: Buffer.byteLength(typeof res.body === 'string' ? res.body : JSON.stringify(res.body ?? '')) };
}

/**
 * Layouts whose bay fits no paper: the sheet routes refuse them with 422 and the reason. At 1:25 a
 * bay longer than about 9 m cannot fit A3's drawing area (400 mm of frame less the plan's
 * margins); these bays are 20 m (doors and arches) and tens of metres (5,000 modules in rows).
 */
const FITS_NO_PAPER = new Set(['5,000 modules', 'maximum doors and arches']);
const sheetStatus = (name: string) => [FITS_NO_PAPER.has(name) ? 422 : 200];

describe.each(ADVERSARIAL_LAYOUTS.map((l, i) => [l.name, i] as const))('%s', (name, i) => {
  const s = () => stored[i];

  it('POST /api/checks', async () => {
    await timed(`${name} POST /api/checks`, () => viaRoute(checksRoute.POST, { method: 'POST', json: s().doc, as: w.designer }));
  });

  it('GET /api/layouts/:id/checks', async () => {
    await timed(`${name} layout checks`, () => viaRoute(layoutChecks.GET, { params: { id: s().id }, as: w.client }));
  });

  it('GET /api/v/:token/checks (no session)', async () => {
    await timed(`${name} viewer checks`, () => viaRoute(viewerChecks.GET as Parameters<typeof call>[0], { params: { token: s().token } }));
  });

  it('GET /api/layouts/:id/revisions/compare', async () => {
    await timed(`${name} compare`, () => viaRoute(compareRoute.GET, { path: `/api/layouts/${s().id}/revisions/compare?from=A&to=current`, params: { id: s().id }, as: w.designer }));
  });

  it('GET /api/layouts/:id/sheet (PDF)', { timeout: 60_000 }, async () => {
    await timed(
      `${name} sheet PDF`,
      async () => {
        const res = await call(sheetRoute.GET, { path: `/api/layouts/${s().id}/sheet?paper=a3&scale=25`, params: { id: s().id }, as: w.designer });
        return { status: res.status, bytes: Number(res.headers.get('content-length') ?? Buffer.byteLength(String(res.body))) };
      },
      sheetStatus(name),
    );
  });

  it('the plan sheet print view (SVG)', { timeout: 60_000 }, async () => {
    const actor = (await loadActor(w.designer.id, w.designer.studioId, 0))!;
    await timed(
      `${name} sheet SVG`,
      async () => {
        const ctx = await sheetRequestFor(actor, s().id);
        const result = await runJob('sheet', { ...ctx.request, paper: 'a3', scale: 25 }).catch((e: unknown) => {
          if (e instanceof WorkPoolBusyError) return null;
          throw e;
        });
        if (!result) return { status: 503, bytes: 0 };
        if (!result.ok) return { status: 422, bytes: Buffer.byteLength(JSON.stringify(result)) };
        const markup = result.sheet.pages.map((page, k) => renderToStaticMarkup(createElement(SheetSvg, { page, number: k + 1, label: `Sheet ${k + 1}` }))).join('');
        return { status: 200, bytes: Buffer.byteLength(markup) };
      },
      sheetStatus(name),
      LIMIT_PRINT_MARKUP,
    );
  });
});
