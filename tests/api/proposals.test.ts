// POST /api/proposals: the workshop's work, a validated brief, the work pool, and what comes back.
import { beforeAll, describe, expect, it } from 'vitest';
import { forgetAllBuckets } from '@/server/api/rate-limit';
import * as proposals from '@/app/api/proposals/route';
import * as layouts from '@/app/api/layouts/route';
import * as layoutChecks from '@/app/api/layouts/[id]/checks/route';
import { TYPICAL_BRIEF } from '@/lib/proposals/brief';
import type { Db } from '@/db/client';
import { useFreshDb } from '../helpers/db';
import { call, sessionCookie } from '../helpers/http';
import { NDJSON } from '@/lib/api/progress-stream';
import { workPool } from '@/lib/workers/pool';
import { buildWorld, type World } from '../helpers/world';

// A long bay's search is about 2 s alone, but several times that while the whole suite shares two
// cores; this file's pool (made on first use, after this line) gives a job a minute, so the test
// measures the route, not the machine's load. The production limit stays BAYWRIGHT_JOB_TIMEOUT_MS.
process.env.BAYWRIGHT_JOB_TIMEOUT_MS ??= '60000';

let db: Db;
let w: World;
beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
});

const brief = { ...TYPICAL_BRIEF, bay: { source: 'template', template: 'l3h2' } };

describe('POST /api/proposals', () => {
  it('gives a designer checked proposals that open as a new layout with every check met', async () => {
    const res = await call(proposals.POST, { method: 'POST', as: w.designer, json: brief });
    expect(res.status).toBe(200);
    expect(res.body.ok).toBe(true);
    expect(res.body.proposals.length).toBeGreaterThanOrEqual(3);
    const first = res.body.proposals[0];
    expect(first.scores.map((s: { metric: string }) => s.metric).sort()).toEqual(['balance', 'bed', 'counter', 'floor', 'storage', 'walkway']);
    // Opened through the ordinary create path, the stored layout checks clean.
    const created = await call(layouts.POST, { method: 'POST', as: w.designer, json: { name: 'Proposal from the brief', doc: first.doc } });
    expect(created.status).toBe(201);
    const checked = await call(layoutChecks.GET, { method: 'GET', as: w.designer, params: { id: created.body.id } });
    expect(checked.status).toBe(200);
    expect(checked.body.findings.filter((f: { status: string }) => f.status === 'fail')).toEqual([]);
  }, 60_000);

  it('says why a brief cannot be met, with the rule and both numbers', async () => {
    const res = await call(proposals.POST, { method: 'POST', as: w.owner, json: { ...brief, bed: 'across', sleepers: [1870, 1650] } });
    expect(res.status).toBe(200);
    expect(res.body.ok).toBe(false);
    // 1870 + 100 mm = 1970 mm needed; 1800 − 2 × 36 mm wall build-up = 1728 mm lined width.
    expect(res.body.reasons).toContainEqual(expect.objectContaining({ rule: 'Bed length', required: 1970, measured: 1728 }));
  }, 60_000);

  it('refuses a client', async () => {
    const res = await call(proposals.POST, { method: 'POST', as: w.client, json: brief });
    expect(res.status).toBe(403);
  });

  it('refuses a bad brief with the field and changes nothing', async () => {
    const res = await call(proposals.POST, { method: 'POST', as: w.designer, json: { ...brief, sleepers: [] } });
    expect(res.status).toBe(400);
    expect(res.body.issues).toContainEqual(expect.objectContaining({ path: 'sleepers' }));
    const unknown = await call(proposals.POST, { method: 'POST', as: w.designer, json: { ...brief, bay: { source: 'template', template: 'l9h9' } } });
    expect(unknown.status).toBe(400);
    expect(unknown.body.issues).toContainEqual(expect.objectContaining({ path: 'bay.template' }));
  });

  it('answers 429 with Retry-After when one person asks too often', async () => {
    const statuses: number[] = [];
    let retry: string | null = null;
    for (let i = 0; i < 6; i++) {
      const res = await call(proposals.POST, { method: 'POST', as: w.owner, json: { ...brief, sleepers: 'x' } });
      statuses.push(res.status);
      if (res.status === 429) retry = res.headers.get('retry-after');
    }
    expect(statuses).toContain(429);
    expect(Number(retry)).toBeGreaterThan(0);
  });
});

describe('POST /api/proposals as a progress stream', () => {
  // The 429 test above empties the buckets on purpose; whether they have refilled by now depends
  // on how fast the machine ran the tests before. The stream is what is tested here.
  beforeAll(() => forgetAllBuckets());

  const streamed = async (signal?: AbortSignal) => {
    const cookie = await sessionCookie(w.designer);
    const req = new Request('http://localhost:3000/api/proposals', {
      method: 'POST',
      headers: { host: 'localhost:3000', cookie, 'content-type': 'application/json', accept: NDJSON },
      body: JSON.stringify({ ...brief, bay: { source: 'template', template: 'l4h3' }, toilet: true, shower: true }),
      signal,
    });
    return proposals.POST(req, undefined as never);
  };

  it('sends lines of progress, then the result', async () => {
    const res = await streamed();
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe(NDJSON);
    const lines = (await res.text()).trim().split('\n').map((l) => JSON.parse(l));
    const steps = lines.slice(0, -1);
    expect(steps.length).toBeGreaterThan(1);
    for (const s of steps) expect(s).toEqual({ done: expect.any(Number), total: expect.any(Number) });
    expect(steps[steps.length - 1].done).toBe(steps[steps.length - 1].total);
    expect(lines[lines.length - 1].result.ok).toBe(true);
  }, 120_000);

  it('stops the work when the caller goes away, and the pool is free again', async () => {
    const abort = new AbortController();
    const res = await streamed(abort.signal);
    const reader = res.body!.getReader();
    await reader.read(); // the first progress line: the search is under way
    abort.abort();
    await reader.cancel();
    // The search stops at its next candidate; the worker is free within the cancel grace.
    const t0 = Date.now();
    while (workPool().load.running > 0 && Date.now() - t0 < 5000) await new Promise((r) => setTimeout(r, 20));
    expect(workPool().load).toEqual({ running: 0, waiting: 0 });
  }, 120_000);

  it('a plain request whose caller went away answers 499', async () => {
    const abort = new AbortController();
    // Another studio's owner: this file's other tests have used up the burst of its own owner.
    const cookie = await sessionCookie(w.foreignOwner);
    const req = new Request('http://localhost:3000/api/proposals', {
      method: 'POST',
      headers: { host: 'localhost:3000', cookie, 'content-type': 'application/json' },
      body: JSON.stringify({ ...brief, bay: { source: 'template', template: 'l4h3' }, toilet: true, shower: true }),
      signal: abort.signal,
    });
    const answer = proposals.POST(req, undefined as never);
    setTimeout(() => abort.abort(), 200);
    const res = await answer;
    expect(res.status).toBe(499);
    expect((await res.json()).error).toMatch(/cancelled/);
    const t0 = Date.now();
    while (workPool().load.running > 0 && Date.now() - t0 < 5000) await new Promise((r) => setTimeout(r, 20));
    expect(workPool().load).toEqual({ running: 0, waiting: 0 });
  }, 120_000);
});
