// GET /api/layouts/:id/sheet as each role, with good and bad queries.
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import * as sheet from '@/app/api/layouts/[id]/sheet/route';
import * as layoutsRoute from '@/app/api/layouts/route';
import * as oneLayout from '@/app/api/layouts/[id]/route';
import * as revisions from '@/app/api/layouts/[id]/revisions/route';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { sessionCookie, type SessionUser } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { readPdf } from './read-pdf';

let db: Db;
let w: World;

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
});

// The designer asks for more sheets here than the per-user limit allows in a burst; the limit
// has its own test. Without this the file fails whenever it runs fast enough.
beforeEach(() => {
  sheet.sheetLimiter.clear();
  sheet.sheetAddressLimiter.clear();
});

async function get(id: string, as: SessionUser | null, query = '') {
  const headers: Record<string, string> = { host: 'localhost:3000' };
  if (as) headers.cookie = await sessionCookie(as);
  const res = await sheet.GET(new Request(`http://localhost:3000/api/layouts/${id}/sheet${query}`, { headers }), { params: Promise.resolve({ id }) });
  const bytes = new Uint8Array(await res.arrayBuffer());
  const text = new TextDecoder().decode(bytes);
  let json: Record<string, unknown> | null = null;
  try {
    json = JSON.parse(text);
  } catch {
    /* a PDF */
  }
  return { status: res.status, headers: res.headers, bytes, json };
}

describe('GET /api/layouts/:id/sheet', () => {
  it.each(['owner', 'designer', 'client'] as const)('gives the %s an A4 PDF at 1:20 by default', async (who) => {
    const res = await get(w.clientLayoutId, w[who]);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    expect(res.headers.get('x-content-type-options')).toBe('nosniff');
    expect(res.headers.get('content-disposition')).toMatch(/^attachment; filename=".*plan sheet A4 1-20\.pdf"/);
    expect(new TextDecoder().decode(res.bytes.slice(0, 5))).toBe('%PDF-');
    const read = await readPdf(res.bytes);
    expect(read.pages[0].width).toBeCloseTo(841.89, 1);
    const words = read.pages[0].texts.map((t) => t.str);
    expect(words).toEqual(expect.arrayContaining(['Saltmarsh Van Works', 'Nair — L2H2 weekender', 'Priya Nair', 'Preliminary', '1:20']));
  });

  it('makes A3 at 1:25 when asked', async () => {
    const res = await get(w.clientLayoutId, w.designer, '?paper=a3&scale=25');
    expect(res.status).toBe(200);
    const read = await readPdf(res.bytes);
    expect(read.pages[0].width).toBeCloseTo(1190.55, 1);
    expect(read.pages[0].texts.map((t) => t.str)).toContain('1:25');
  });

  it('answers 422 with a suggestion when the bay does not fit at that scale', async () => {
    const res = await get(w.clientLayoutId, w.designer, '?paper=a4&scale=10');
    expect(res.status).toBe(422);
    expect(res.json?.error).toMatch(/does not fit on A4 landscape at 1:10.*Choose 1:20 on A4/);
    expect(res.json?.suggestion).toEqual({ paper: 'a4', scale: 20 });
  });

  it.each([
    ['an unknown paper', '?paper=letter', 'paper'],
    ['an unknown scale', '?scale=15', 'scale'],
    ['a scale that is not a number', '?scale=twenty', 'scale'],
    ['an unknown parameter', '?paper=a4&colour=red', ''],
  ])('answers 400 for %s, naming the field', async (_what, query, field) => {
    const res = await get(w.clientLayoutId, w.designer, query);
    expect(res.status).toBe(400);
    expect((res.json?.issues as { path: string }[]).map((i) => i.path)).toContain(field);
  });

  it('answers 404 to a client of another layout, another studio and nonsense ids; 401 to anonymous', async () => {
    expect((await get(w.clientLayoutId, w.otherClient)).status).toBe(404);
    expect((await get(w.clientLayoutId, w.foreignOwner)).status).toBe(404);
    expect((await get(w.clientLayoutId, w.foreignClient)).status).toBe(404);
    expect((await get(w.foreignLayoutId, w.owner)).status).toBe(404);
    expect((await get('not-a-layout', w.owner)).status).toBe(404);
    expect((await get(w.clientLayoutId, null)).status).toBe(401);
  });

  it('answers 404, not 400, to a stranger with a bad query (rights come first)', async () => {
    expect((await get(w.clientLayoutId, w.foreignOwner, '?paper=letter')).status).toBe(404);
  });

  it('answers 429 after a burst of sheets from one user, and serves the next user', async () => {
    const who = w.foreignClient;
    const statuses: number[] = [];
    for (let i = 0; i < 12; i++) statuses.push((await get(w.clientLayoutId, who)).status); // 404s spend tokens too: no free probing
    expect(statuses.slice(0, 9).every((s) => s === 404)).toBe(true);
    expect(statuses.slice(-1)).toEqual([429]);
    const res = await get(w.foreignLayoutId, who); // even their own layout, until the bucket refills
    expect(res.status).toBe(429);
    expect(res.json?.error).toMatch(/wait a few seconds/);
    expect((await get(w.foreignLayoutId, w.foreignOwner)).status).toBe(200);
  });

  it('prints an issued revision by its letter: the frozen document, with the letter in the title block', async () => {
    const cookie = { cookie: await sessionCookie(w.designer), host: 'localhost:3000', 'content-type': 'application/json' };
    const issued = await revisions.POST(new Request(`http://localhost:3000/api/layouts/${w.otherLayoutId}/revisions`, { method: 'POST', headers: cookie, body: JSON.stringify({ note: 'First issue' }) }), { params: Promise.resolve({ id: w.otherLayoutId }) });
    expect(issued.status).toBe(201);
    const { revision: { letter } } = await issued.json();
    expect(letter).toMatch(/^[A-Z]+$/);
    // Change the layout after issuing: the revision's sheet must not follow.
    const cur = await (await oneLayout.GET(new Request(`http://localhost:3000/api/layouts/${w.otherLayoutId}`, { headers: cookie }), { params: Promise.resolve({ id: w.otherLayoutId }) })).json();
    const doc = structuredClone(cur.doc);
    doc.modules[0].label = 'Relabelled after the issue';
    const saved = await oneLayout.PUT(new Request(`http://localhost:3000/api/layouts/${w.otherLayoutId}`, { method: 'PUT', headers: { ...cookie, 'if-match': String(cur.version) }, body: JSON.stringify({ doc }) }), { params: Promise.resolve({ id: w.otherLayoutId }) });
    expect(saved.status).toBe(200);

    const frozen = await get(w.otherLayoutId, w.otherClient, `?revision=${letter}`);
    expect(frozen.status).toBe(200);
    expect(frozen.headers.get('content-disposition')).toMatch(new RegExp(`rev ${letter} A4 1-20\\.pdf`));
    const read = await readPdf(frozen.bytes);
    expect(read.pages[0].texts.map((t) => t.str)).toContain(letter);
    const all = read.pages.map((p) => p.text).join(' ');
    expect(all).not.toContain('Relabelled after the issue');
    // Left to choose, the sheet follows the issued revision; the layout as last saved only when chosen.
    const byDefault = await readPdf((await get(w.otherLayoutId, w.designer)).bytes);
    expect(byDefault.pages.map((p) => p.text).join(' ')).not.toContain('Relabelled after the issue');
    expect(byDefault.pages[0].texts.map((t) => t.str)).toContain(letter);
    const working = await readPdf((await get(w.otherLayoutId, w.designer, '?revision=preliminary')).bytes);
    expect(working.pages.map((p) => p.text).join(' ')).toContain('Relabelled after the issue');
    expect(working.pages[0].texts.map((t) => t.str)).toContain('Preliminary');
  });

  it('answers 404 for a revision that was never issued and 400 for a malformed letter', async () => {
    expect((await get(w.clientLayoutId, w.designer, '?revision=Q')).status).toBe(404);
    const bad = await get(w.clientLayoutId, w.designer, '?revision=b');
    expect(bad.status).toBe(400);
    expect((bad.json?.issues as { path: string }[]).map((i) => i.path)).toContain('revision');
    expect((await get(w.clientLayoutId, w.foreignOwner, '?revision=A')).status).toBe(404);
  });

  it('prints an empty bay too (no modules, no doors)', async () => {
    const made = await layoutsRoute.POST(
      new Request('http://localhost:3000/api/layouts', { method: 'POST', headers: { host: 'localhost:3000', 'content-type': 'application/json', cookie: await sessionCookie(w.designer) }, body: JSON.stringify({ name: 'Bare L1H1', bayTemplateId: 'l1h1' }) }),
      undefined as never,
    );
    const { id } = await made.json();
    const res = await get(id, w.designer);
    expect(res.status).toBe(200);
    const read = await readPdf(res.bytes);
    expect(read.pages.map((p) => p.text).join(' ')).toContain('No modules placed yet.');
  });
});
