// Issued means frozen: once revision B is approved, editing the layout starts the next revision's
// preliminary — the table and the standing route say "changed since B", the client and a live
// viewer link still see B, the sheet, the parts list and the quote default to B — and once C is
// issued and approved, the documents follow C. A quote records its revision; one for a revision
// that is not approved is sent only when confirmed, and says so.
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import * as layoutRoute from '@/app/api/layouts/[id]/route';
import * as layoutList from '@/app/api/layouts/route';
import * as revisionsRoute from '@/app/api/layouts/[id]/revisions/route';
import * as decision from '@/app/api/layouts/[id]/revisions/[revisionId]/decision/route';
import * as standing from '@/app/api/layouts/[id]/revisions/standing/route';
import * as links from '@/app/api/layouts/[id]/links/route';
import * as viewer from '@/app/api/v/[token]/route';
import * as viewerVersion from '@/app/api/v/[token]/version/route';
import * as sheet from '@/app/api/layouts/[id]/sheet/route';
import * as quoteRoute from '@/app/api/layouts/[id]/quote/route';
import * as partsRoute from '@/app/api/layouts/[id]/quote/parts/route';
import * as prices from '@/app/api/studio/prices/route';
import { quotes } from '@/db/schema';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call, sessionCookie, type SessionUser } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { readPdf } from '../sheet/read-pdf';
import { demoPriceList } from '../../scripts/lib/demo-prices';

let db: Db;
let w: World;
let id: string;
let token: string;

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  id = w.clientLayoutId;
  expect((await call(prices.PUT, { method: 'PUT', as: w.owner, json: demoPriceList() })).status).toBe(200);
  const link = await call(links.POST, { method: 'POST', params: { id }, as: w.designer, json: {} });
  expect(link.status).toBe(201);
  token = (link.body.path as string).split('/').pop()!;
});

beforeEach(() => {
  sheet.sheetLimiter.clear();
  sheet.sheetAddressLimiter.clear();
});

/** Saves the layout with its first module relabelled; answers the new version. */
async function relabel(label: string): Promise<number> {
  const cur = await call(layoutRoute.GET, { params: { id }, as: w.designer });
  const doc = structuredClone(cur.body.doc);
  doc.modules[0].label = label;
  const res = await call(layoutRoute.PUT, { method: 'PUT', params: { id }, as: w.designer, json: { doc }, headers: { 'if-match': String(cur.body.version) } });
  expect(res.status).toBe(200);
  return res.body.version;
}

async function issue(note: string): Promise<{ id: string; letter: string; layoutVersion: number }> {
  const res = await call(revisionsRoute.POST, { method: 'POST', params: { id }, as: w.designer, json: { note } });
  expect(res.status).toBe(201);
  return res.body.revision;
}

async function decide(revisionId: string, json: Record<string, string>) {
  const res = await call(decision.POST, { method: 'POST', params: { id, revisionId }, as: w.client, json });
  expect(res.status).toBe(201);
}

async function sheetText(as: SessionUser, query = ''): Promise<{ text: string; firstPage: string[] }> {
  const headers = { host: 'localhost:3000', cookie: await sessionCookie(as) };
  const res = await sheet.GET(new Request(`http://localhost:3000/api/layouts/${id}/sheet${query}`, { headers }), { params: Promise.resolve({ id }) });
  expect(res.status).toBe(200);
  const read = await readPdf(new Uint8Array(await res.arrayBuffer()));
  return { text: read.pages.map((p) => p.text).join(' '), firstPage: read.pages[0].texts.map((t) => t.str) };
}

const tableRow = async (as: SessionUser) => {
  const res = await call(layoutList.GET, { as });
  expect(res.status).toBe(200);
  return (res.body.layouts as { id: string; sharing: { state: string; latestRevision: string | null; changedSince: boolean } }[]).find((l) => l.id === id)!;
};

const sendQuote = (json: Record<string, unknown>) =>
  call(quoteRoute.POST, { method: 'POST', params: { id }, as: w.designer, json: { depositPct: 25, ...json } });

describe('approve B, then edit: the next preliminary starts and B stays frozen', () => {
  let b: { id: string; letter: string; layoutVersion: number };

  it('gets to an approved revision B through a returned revision A', async () => {
    await relabel('Bed as first drawn');
    const a = await issue('First issue');
    expect(a.letter).toBe('A');
    await decide(a.id, { decision: 'changes', message: 'Longer bed, please.' });
    await relabel('Bed as approved');
    b = await issue('Longer bed');
    expect(b.letter).toBe('B');
    await decide(b.id, { decision: 'approve' });
    const row = await tableRow(w.designer);
    expect(row.sharing).toMatchObject({ state: 'approved', latestRevision: 'B', changedSince: false });
  });

  it('says "changed since B" in the table and the standing route once the layout is saved again', async () => {
    const edited = await relabel('Bed moved after approval');
    expect(edited).toBeGreaterThan(b.layoutVersion);
    for (const who of [w.designer, w.owner]) {
      expect((await tableRow(who)).sharing).toMatchObject({ state: 'approved', latestRevision: 'B', changedSince: true });
    }
    const res = await call(standing.GET, { params: { id }, as: w.designer });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      layoutVersion: edited,
      changedSince: true,
      latest: { letter: 'B', state: 'approved', layoutVersion: b.layoutVersion },
      documentsRevision: 'B',
      clientRevision: 'B',
    });
    expect(res.body.revisions.map((r: { letter: string; state: string }) => `${r.letter}:${r.state}`)).toEqual(['B:approved', 'A:changes-asked']);
    // No documents and no rows: a DTO of letters, states and versions.
    expect(JSON.stringify(res.body)).not.toMatch(/"doc"|layout_id|studio_id/);
  });

  it('shows the client and a live viewer link revision B, not the edit', async () => {
    const client = await call(standing.GET, { params: { id }, as: w.client });
    expect(client.status).toBe(200);
    expect(client.body.clientRevision).toBe('B');
    const seen = await call(viewer.GET, { params: { token } });
    expect(seen.status).toBe(200);
    expect(seen.body.revision).toMatchObject({ letter: 'B', state: 'approved' });
    expect(seen.body.kind).toBe('live');
    expect(seen.body.doc.modules[0].label).toBe('Bed as approved');
    expect(seen.body.version).toBe(b.layoutVersion);
    expect((await call(viewerVersion.GET, { params: { token } })).body.version).toBe(b.layoutVersion);
  });

  it('hides the standing of the layout from strangers (404) and anonymous callers (401)', async () => {
    expect((await call(standing.GET, { params: { id }, as: null })).status).toBe(401);
    for (const who of [w.otherClient, w.foreignOwner]) expect((await call(standing.GET, { params: { id }, as: who })).status).toBe(404);
    expect((await call(standing.GET, { params: { id: 'not-an-id' }, as: w.designer })).status).toBe(404);
  });

  it('prints the sheet of B by default, and the preliminary only when chosen (title block "Preliminary")', async () => {
    const byDefault = await sheetText(w.designer);
    expect(byDefault.text).toContain('Bed as approved');
    expect(byDefault.text).not.toContain('Bed moved after approval');
    expect(byDefault.firstPage).toContain('B');
    expect(byDefault.firstPage).not.toContain('Preliminary');
    const draft = await sheetText(w.designer, '?revision=preliminary');
    expect(draft.text).toContain('Bed moved after approval');
    expect(draft.firstPage).toContain('Preliminary');
    const older = await sheetText(w.client, '?revision=A');
    expect(older.text).toContain('Bed as first drawn');
  }, 90_000); // three full sheets drawn and read back: seconds each on a busy machine

  it('prices the parts list from B by default and from the preliminary only when chosen', async () => {
    const byDefault = await call(partsRoute.GET, { params: { id }, as: w.designer, path: '/parts' });
    expect(byDefault.status).toBe(200);
    expect(byDefault.body.revision).toMatchObject({ letter: 'B', state: 'approved' });
    expect(byDefault.body.version).toBe(b.layoutVersion);
    const draft = await call(partsRoute.GET, { params: { id }, as: w.designer, path: '/parts?revision=preliminary' });
    expect(draft.body.revision).toBeNull();
    expect(draft.body.version).toBeGreaterThan(b.layoutVersion);
    expect((await call(partsRoute.GET, { params: { id }, as: w.designer, path: '/parts?revision=Q' })).status).toBe(404);
    expect((await call(partsRoute.GET, { params: { id }, as: w.designer, path: '/parts?revision=b' })).status).toBe(400);
    const csv = await call(partsRoute.GET, { params: { id }, as: w.designer, path: '/parts?format=csv' });
    expect(csv.headers.get('content-disposition')).toMatch(/-rev-B-parts\.csv"$/);
  });

  it('sends the quote for B without asking, and records the revision', async () => {
    const res = await sendQuote({ layoutVersion: b.layoutVersion });
    expect(res.status).toBe(201);
    expect(res.body.quote.revision).toEqual({ letter: 'B', approved: true });
    expect(res.body.quote.layoutVersion).toBe(b.layoutVersion);
    const [row] = await db.select().from(quotes).where(eq(quotes.id, res.body.quote.id));
    expect(row).toMatchObject({ revisionId: b.id, revisionLetter: 'B', revisionApproved: true });
    // The version of another copy than the one priced is refused (412), naming the one to price.
    const stale = await sendQuote({ layoutVersion: b.layoutVersion + 100 });
    expect(stale.status).toBe(412);
    expect(stale.body.current).toMatchObject({ version: b.layoutVersion, revision: 'B' });
  });

  it('asks for confirmation before a quote of the preliminary, stores nothing until confirmed, then says so', async () => {
    const before = (await db.select().from(quotes).where(eq(quotes.layoutId, id))).length;
    const std = (await call(standing.GET, { params: { id }, as: w.designer })).body;
    const asked = await sendQuote({ layoutVersion: std.layoutVersion, revision: 'preliminary' });
    expect(asked.status).toBe(409);
    expect(asked.body).toMatchObject({ confirm: 'unapproved-revision', revision: null });
    expect(asked.body.error).toMatch(/preliminary layout/);
    expect((await db.select().from(quotes).where(eq(quotes.layoutId, id))).length).toBe(before);
    const sent = await sendQuote({ layoutVersion: std.layoutVersion, revision: 'preliminary', confirmUnapproved: true });
    expect(sent.status).toBe(201);
    expect(sent.body.quote.revision).toBeNull();
    // Bad choices are refused with a message and store nothing.
    for (const revision of ['b', 'preliminaries', 12]) {
      const bad = await sendQuote({ layoutVersion: std.layoutVersion, revision });
      expect(bad.status, String(revision)).toBe(400);
    }
    expect((await sendQuote({ layoutVersion: std.layoutVersion, revision: 'Q', confirmUnapproved: true })).status).toBe(404);
    expect((await db.select().from(quotes).where(eq(quotes.layoutId, id))).length).toBe(before + 1);
  });

  it('issues C: documents stay on B until C is approved, the client and the viewer see C, and a quote of C needs confirming', async () => {
    const c = await issue('Bed moved');
    expect(c.letter).toBe('C');
    const std = (await call(standing.GET, { params: { id }, as: w.client })).body;
    expect(std).toMatchObject({ documentsRevision: 'B', clientRevision: 'C', changedSince: false });
    expect((await call(viewer.GET, { params: { token } })).body.revision).toMatchObject({ letter: 'C', state: 'sent' });
    expect((await sheetText(w.designer)).text).toContain('Bed as approved');

    const asked = await sendQuote({ layoutVersion: c.layoutVersion, revision: 'C' });
    expect(asked.status).toBe(409);
    expect(asked.body).toMatchObject({ confirm: 'unapproved-revision', revision: 'C' });
    expect(asked.body.error).toMatch(/Revision C is not approved yet \(Issued for approval\)/);
    const sent = await sendQuote({ layoutVersion: c.layoutVersion, revision: 'C', confirmUnapproved: true });
    expect(sent.status).toBe(201);
    expect(sent.body.quote.revision).toEqual({ letter: 'C', approved: false });

    // The client approves C: every document now follows C.
    await decide(c.id, { decision: 'approve' });
    const after = (await call(standing.GET, { params: { id }, as: w.designer })).body;
    expect(after).toMatchObject({ documentsRevision: 'C', clientRevision: 'C', changedSince: false, latest: { letter: 'C', state: 'approved' } });
    const printed = await sheetText(w.client);
    expect(printed.text).toContain('Bed moved after approval');
    expect(printed.firstPage).toContain('C');
    const parts = await call(partsRoute.GET, { params: { id }, as: w.designer, path: '/parts' });
    expect(parts.body.revision).toMatchObject({ letter: 'C', state: 'approved' });
    const quote = await sendQuote({ layoutVersion: c.layoutVersion });
    expect(quote.status).toBe(201);
    expect(quote.body.quote.revision).toEqual({ letter: 'C', approved: true });
    expect((await tableRow(w.designer)).sharing).toMatchObject({ state: 'approved', latestRevision: 'C', changedSince: false });
  }, 90_000);
});
