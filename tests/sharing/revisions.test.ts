// Revisions and approval: issue, list, read, decide and compare, each as every role; bad input
// gets 4xx and changes nothing; an approval is final.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { count, eq } from 'drizzle-orm';
import * as list from '@/app/api/layouts/[id]/revisions/route';
import * as one from '@/app/api/layouts/[id]/revisions/[revisionId]/route';
import * as decision from '@/app/api/layouts/[id]/revisions/[revisionId]/decision/route';
import * as compare from '@/app/api/layouts/[id]/revisions/compare/route';
import * as layoutRoute from '@/app/api/layouts/[id]/route';
import * as layoutList from '@/app/api/layouts/route';
import { layouts, revisionDecisions, revisions } from '@/db/schema';
import type { Db } from '@/db/client';
import type { FakeSmtp } from '@/dev/fakes/smtp/server';
import { useFreshDb } from '../helpers/db';
import { call } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';
import { as, mailFor, startMailSink, STRANGERS, linkIn } from './helpers';

let db: Db;
let w: World;
let smtp: FakeSmtp;

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
  smtp = await startMailSink();
});
afterAll(() => smtp.close());

const revCount = async (layoutId: string) => (await db.select({ n: count() }).from(revisions).where(eq(revisions.layoutId, layoutId)))[0].n;
const decisionCount = async () => (await db.select({ n: count() }).from(revisionDecisions))[0].n;

async function saveAChange(layoutId: string, who = w.designer) {
  const cur = await call(layoutRoute.GET, { params: { id: layoutId }, as: who });
  const doc = { ...cur.body.doc, modules: cur.body.doc.modules.map((m: { x: number }, i: number) => (i === 0 ? { ...m, x: m.x + 10 } : m)) };
  const res = await call(layoutRoute.PUT, { method: 'PUT', params: { id: layoutId }, as: who, json: { doc }, headers: { 'if-match': String(cur.body.version) } });
  expect(res.status).toBe(200);
}

describe('issuing revisions', () => {
  it('refuses anonymous callers (401), strangers (404) and the client (403), and stores nothing', async () => {
    const id = w.clientLayoutId;
    expect((await call(list.POST, { method: 'POST', params: { id }, as: null, json: { note: 'x' } })).status).toBe(401);
    for (const who of STRANGERS) {
      const res = await call(list.POST, { method: 'POST', params: { id }, as: as(w, who), json: { note: 'x' } });
      expect(res.status, who).toBe(404);
    }
    const client = await call(list.POST, { method: 'POST', params: { id }, as: w.client, json: { note: 'x' } });
    expect(client.status).toBe(403);
    expect(client.body.error).toMatch(/only the workshop/i);
    expect(await revCount(id)).toBe(0);
  });

  it('refuses bad bodies with 4xx and a message, storing nothing', async () => {
    const id = w.clientLayoutId;
    const cases = [
      { json: { note: 'x'.repeat(2001) }, status: 400 },
      { json: { note: 'ok', extra: 1 }, status: 400 },
      { json: { note: 42 }, status: 400 },
      { body: 'not json', headers: { 'content-type': 'application/json' }, status: 400 },
      { body: 'note=x', headers: { 'content-type': 'application/x-www-form-urlencoded' }, status: 415 },
    ];
    for (const c of cases) {
      const res = await call(list.POST, { method: 'POST', params: { id }, as: w.designer, json: c.json, body: c.body, headers: c.headers });
      expect(res.status, JSON.stringify(c)).toBe(c.status);
      expect(typeof res.body.error).toBe('string');
    }
    expect(await revCount(id)).toBe(0);
  });

  it('refuses a request from another site (CSRF), storing nothing', async () => {
    const res = await call(list.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.designer, json: { note: 'x' }, headers: { origin: 'https://evil.test' } });
    expect(res.status).toBe(403);
    expect(await revCount(w.clientLayoutId)).toBe(0);
  });

  it('lets a designer issue revision A with a note, and mails the client a link to it', async () => {
    const res = await call(list.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.designer, json: { note: 'First proposal: bed across the rear.' } });
    expect(res.status).toBe(201);
    expect(res.body.revision).toMatchObject({ letter: 'A', note: 'First proposal: bed across the rear.', state: 'sent', issuedBy: 'Ivo Brandt', isLatest: true, approval: null });
    expect(res.body.revision).not.toHaveProperty('doc');
    expect(res.body.mail).toBe('sent');
    const [mail] = await mailFor(db, 'priya@client.test');
    expect(mail.parsed.subject).toBe('Revision A of Nair — L2H2 weekender is issued for your approval');
    expect(linkIn(mail.parsed, '/layouts/').pathname).toBe(`/layouts/${w.clientLayoutId}/revisions`);
    expect(mail.parsed.text).toContain('> First proposal: bed across the rear.');
  });

  it('refuses a second revision of the same saved version (409), then letters the next one B', async () => {
    const again = await call(list.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.owner, json: { note: '' } });
    expect(again.status).toBe(409);
    expect(again.body.error).toMatch(/Revision A already freezes/);
    await saveAChange(w.clientLayoutId);
    const b = await call(list.POST, { method: 'POST', params: { id: w.clientLayoutId }, as: w.owner, json: {} });
    expect(b.status).toBe(201);
    expect(b.body.revision.letter).toBe('B');
    expect(await revCount(w.clientLayoutId)).toBe(2);
  });

  it('freezes the document: later saves do not change a revision', async () => {
    const listed = await call(list.GET, { params: { id: w.clientLayoutId }, as: w.designer });
    const a = listed.body.revisions.find((r: { letter: string }) => r.letter === 'A');
    const before = await call(one.GET, { params: { id: w.clientLayoutId, revisionId: a.id }, as: w.designer });
    await saveAChange(w.clientLayoutId);
    const after = await call(one.GET, { params: { id: w.clientLayoutId, revisionId: a.id }, as: w.designer });
    expect(after.body.doc).toEqual(before.body.doc);
    const [row] = await db.select({ doc: layouts.doc }).from(layouts).where(eq(layouts.id, w.clientLayoutId));
    expect(row.doc).not.toEqual(after.body.doc);
  });
});

describe('reading revisions', () => {
  it('lists newest first for the workshop and the layout’s client; 404 for strangers, 401 anonymous', async () => {
    for (const who of ['owner', 'designer', 'client'] as const) {
      const res = await call(list.GET, { params: { id: w.clientLayoutId }, as: w[who] });
      expect(res.status, who).toBe(200);
      expect(res.body.revisions.map((r: { letter: string }) => r.letter)).toEqual(['B', 'A']);
      expect(res.body.revisions.map((r: { isLatest: boolean }) => r.isLatest)).toEqual([true, false]);
    }
    for (const who of STRANGERS) expect((await call(list.GET, { params: { id: w.clientLayoutId }, as: as(w, who) })).status, who).toBe(404);
    expect((await call(list.GET, { params: { id: w.clientLayoutId }, as: null })).status).toBe(401);
  });

  it('reaches a revision only through its own layout', async () => {
    const [rev] = await db.select({ id: revisions.id }).from(revisions).where(eq(revisions.layoutId, w.clientLayoutId)).limit(1);
    expect((await call(one.GET, { params: { id: w.clientLayoutId, revisionId: rev.id }, as: w.client })).status).toBe(200);
    expect((await call(one.GET, { params: { id: w.otherLayoutId, revisionId: rev.id }, as: w.designer })).status).toBe(404);
    expect((await call(one.GET, { params: { id: w.clientLayoutId, revisionId: 'not-a-uuid' }, as: w.designer })).status).toBe(404);
    expect((await call(one.GET, { params: { id: w.clientLayoutId, revisionId: rev.id }, as: w.foreignOwner })).status).toBe(404);
  });
});

describe('approving and asking for changes', () => {
  const ids = async () => {
    const res = await call(list.GET, { params: { id: w.clientLayoutId }, as: w.client });
    return Object.fromEntries(res.body.revisions.map((r: { letter: string; id: string }) => [r.letter, r.id])) as Record<string, string>;
  };

  it('lets nobody but the layout’s client decide, and changes nothing when refused', async () => {
    const { B } = await ids();
    const params = { id: w.clientLayoutId, revisionId: B };
    expect((await call(decision.POST, { method: 'POST', params, as: null, json: { decision: 'approve' } })).status).toBe(401);
    for (const who of ['designer', 'owner'] as const) {
      const res = await call(decision.POST, { method: 'POST', params, as: w[who], json: { decision: 'approve' } });
      expect(res.status, who).toBe(403);
    }
    for (const who of STRANGERS) expect((await call(decision.POST, { method: 'POST', params, as: as(w, who), json: { decision: 'approve' } })).status, who).toBe(404);
    expect(await decisionCount()).toBe(0);
  });

  it('refuses bad decisions with 400, and a superseded revision with 409', async () => {
    const { A, B } = await ids();
    const params = { id: w.clientLayoutId, revisionId: B };
    for (const json of [{ decision: 'changes' }, { decision: 'changes', message: '   ' }, { decision: 'maybe' }, { decision: 'approve', extra: true }, {}]) {
      const res = await call(decision.POST, { method: 'POST', params, as: w.client, json });
      expect(res.status, JSON.stringify(json)).toBe(400);
    }
    const old = await call(decision.POST, { method: 'POST', params: { id: w.clientLayoutId, revisionId: A }, as: w.client, json: { decision: 'approve' } });
    expect(old.status).toBe(409);
    expect(old.body.error).toMatch(/superseded/);
    expect(await decisionCount()).toBe(0);
  });

  it('records changes asked, then an approval with who and when, and mails the workshop', async () => {
    const { B } = await ids();
    const params = { id: w.clientLayoutId, revisionId: B };
    const changes = await call(decision.POST, { method: 'POST', params, as: w.client, json: { decision: 'changes', message: 'Could the fridge move nearer the sliding door?' } });
    expect(changes.status).toBe(201);
    expect(changes.body.revision.state).toBe('changes-asked');
    const approve = await call(decision.POST, { method: 'POST', params, as: w.client, json: { decision: 'approve', message: 'Happy with this.' } });
    expect(approve.status).toBe(201);
    expect(approve.body.revision.state).toBe('approved');
    expect(approve.body.revision.approval).toEqual({ by: 'Priya Nair', at: expect.stringMatching(/^\d{4}-\d\d-\d\dT/) });
    expect(approve.body.revision.decisions.map((d: { decision: string }) => d.decision)).toEqual(['changes-asked', 'approved']);
    // Revision B was issued by the owner: the owner hears of it.
    const mails = await mailFor(db, 'maren@saltmarsh.test');
    expect(mails.map((m) => m.parsed.subject)).toEqual(expect.arrayContaining([
      'Priya Nair approved revision B of Nair — L2H2 weekender',
      'Priya Nair returned revision B of Nair — L2H2 weekender for changes',
    ]));
  });

  it('never lets an approval change afterwards', async () => {
    const { B } = await ids();
    const params = { id: w.clientLayoutId, revisionId: B };
    for (const json of [{ decision: 'changes', message: 'On second thoughts…' }, { decision: 'approve' }]) {
      const res = await call(decision.POST, { method: 'POST', params, as: w.client, json });
      expect(res.status).toBe(409);
      expect(res.body.error).toMatch(/approved by Priya Nair on \d{1,2} [A-Z][a-z]{2} \d{4}; an approval cannot be changed/);
    }
    const rows = await db.select().from(revisionDecisions).where(eq(revisionDecisions.revisionId, B));
    expect(rows.filter((r) => r.decision === 'approved')).toHaveLength(1);
  });

  it('shows each layout’s state in the layouts list: approved, sent, draft', async () => {
    const res = await call(layoutList.GET, { as: w.designer });
    const state = (name: string) => res.body.layouts.find((l: { name: string }) => l.name === name).sharing;
    expect(state('Nair — L2H2 weekender')).toMatchObject({ state: 'approved', latestRevision: 'B' });
    expect(state('Adeyemi — L3H2 touring')).toMatchObject({ state: 'draft', latestRevision: null });
    const mine = await call(layoutList.GET, { as: w.client });
    expect(mine.body.layouts.map((l: { sharing: { state: string } }) => l.sharing.state)).toEqual(['approved']);
  });

  it('lets only one of two racing approvals land', async () => {
    await saveAChange(w.otherLayoutId);
    const issued = await call(list.POST, { method: 'POST', params: { id: w.otherLayoutId }, as: w.designer, json: { note: 'Touring A' } });
    const params = { id: w.otherLayoutId, revisionId: issued.body.revision.id };
    const results = await Promise.all([1, 2, 3].map(() => call(decision.POST, { method: 'POST', params, as: w.otherClient, json: { decision: 'approve' } })));
    expect(results.map((r) => r.status).sort()).toEqual([201, 409, 409]);
    const rows = await db.select().from(revisionDecisions).where(eq(revisionDecisions.revisionId, issued.body.revision.id));
    expect(rows).toHaveLength(1);
  });
});

describe('comparing revisions', () => {
  it('shows what moved between A and B, and what the current draft changed since B', async () => {
    const res = await call(compare.GET, { params: { id: w.clientLayoutId }, path: '/x?from=A&to=B', as: w.client });
    expect(res.status).toBe(200);
    expect(res.body.from.label).toBe('Revision A');
    expect(res.body.to.label).toBe('Revision B');
    expect(res.body.diff.moved).toHaveLength(1);
    expect(res.body.diff.changed[0].moved).toEqual({ dx: 10, dy: 0, dz: 0 });
    expect(Array.isArray(res.body.findings)).toBe(true);
    const current = await call(compare.GET, { params: { id: w.clientLayoutId }, path: '/x?from=B&to=current', as: w.designer });
    expect(current.status).toBe(200);
    expect(current.body.to.label).toBe('Preliminary, as last saved');
    expect(current.body.diff.moved).toHaveLength(1);
  });

  it('lists a finding that changed status when a module is moved into trouble', async () => {
    const cur = await call(layoutRoute.GET, { params: { id: w.clientLayoutId }, as: w.designer });
    const doc = structuredClone(cur.body.doc);
    // Push the first module through the left wall: fit.inside must fail where it passed.
    doc.modules[0].y = -200;
    const put = await call(layoutRoute.PUT, { method: 'PUT', params: { id: w.clientLayoutId }, as: w.designer, json: { doc }, headers: { 'if-match': String(cur.body.version) } });
    expect(put.status).toBe(200);
    const res = await call(compare.GET, { params: { id: w.clientLayoutId }, path: '/x?from=B&to=current', as: w.designer });
    const worse = res.body.findings.filter((f: { direction: string }) => f.direction === 'worse');
    expect(worse.length).toBeGreaterThan(0);
    expect(worse.some((f: { moduleIds?: string[] }) => f.moduleIds?.includes(doc.modules[0].id))).toBe(true);
  });

  it('answers 400 without both sides, 404 for unknown letters and for strangers', async () => {
    expect((await call(compare.GET, { params: { id: w.clientLayoutId }, path: '/x?from=A', as: w.designer })).status).toBe(400);
    expect((await call(compare.GET, { params: { id: w.clientLayoutId }, path: '/x?from=A&to=Q', as: w.designer })).status).toBe(404);
    expect((await call(compare.GET, { params: { id: w.clientLayoutId }, path: '/x?from=A&to=%3Cscript%3E', as: w.designer })).status).toBe(404);
    for (const who of STRANGERS) expect((await call(compare.GET, { params: { id: w.clientLayoutId }, path: '/x?from=A&to=B', as: as(w, who) })).status, who).toBe(404);
    expect((await call(compare.GET, { params: { id: w.clientLayoutId }, path: '/x?from=A&to=B', as: null })).status).toBe(401);
  });
});
