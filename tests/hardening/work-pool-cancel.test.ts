// Cancelling work in the pool: a waiting job leaves the queue, a running proposals search stops at
// its next candidate and frees its worker, a job that never looks at the flag has its worker
// replaced after the grace, and progress comes through from the worker.
import { afterEach, describe, expect, it } from 'vitest';
import { CANCEL_GRACE_MS, JobCancelledError, WorkPool } from '@/lib/workers/pool';
import { TYPICAL_BRIEF, type Brief } from '@/lib/proposals/brief';
import { stackedOnOneSpot } from './fixtures/adversarial-layouts';
import { l2h2Doc } from '../checks/helpers';

const pools: WorkPool[] = [];
function pool(size: number, queueLimit: number): WorkPool {
  const p = new WorkPool({ size, queueLimit, timeoutMs: 120_000 });
  pools.push(p);
  return p;
}
afterEach(async () => {
  await Promise.all(pools.splice(0).map((p) => p.close()));
});

// A long bay with a wet room: hundreds of candidates, seconds of work — far longer than a cancel takes.
const longSearch: Brief = { ...TYPICAL_BRIEF, bay: { source: 'template', template: 'l4h3' }, toilet: true, shower: true };

describe('cancelling work in the pool', () => {
  it('a running proposals search stops, and the next job runs at once on the freed worker', async () => {
    const p = pool(1, 4);
    await p.run('checks', { doc: l2h2Doc() }); // warm: the worker has started
    const abort = new AbortController();
    const seen: number[] = [];
    const search = p.run('proposals', { brief: longSearch }, { signal: abort.signal, onProgress: (done) => seen.push(done) }).catch((e: unknown) => e);
    // Let it get going (the first progress report), then cancel.
    while (seen.length < 2) await new Promise((r) => setTimeout(r, 20));
    const t0 = performance.now();
    abort.abort();
    expect(await search).toBeInstanceOf(JobCancelledError);
    const next = await p.run('checks', { doc: l2h2Doc() });
    // The next job waited for the search to notice the flag (one candidate), not for the whole search.
    expect(performance.now() - t0).toBeLessThan(CANCEL_GRACE_MS + 2000);
    expect(next.findings.length).toBeGreaterThan(0);
    expect(p.load).toEqual({ running: 0, waiting: 0 });
  }, 120_000);

  it('a waiting job leaves the queue when cancelled and never runs', async () => {
    const p = pool(1, 4);
    const running = p.run('proposals', { brief: longSearch }).catch((e: unknown) => e);
    const abort = new AbortController();
    const waiting = p.run('checks', { doc: l2h2Doc() }, { signal: abort.signal }).catch((e: unknown) => e);
    expect(p.load.waiting).toBe(1);
    abort.abort();
    expect(await waiting).toBeInstanceOf(JobCancelledError);
    expect(p.load.waiting).toBe(0);
    await running;
  }, 120_000);

  it('a job that does not look at the flag has its worker replaced after the grace', async () => {
    const p = pool(1, 4);
    await p.run('checks', { doc: l2h2Doc() });
    const abort = new AbortController();
    const heavy = p.run('checks', { doc: stackedOnOneSpot() }, { signal: abort.signal }).catch((e: unknown) => e);
    await new Promise((r) => setTimeout(r, 50));
    abort.abort();
    expect(await heavy).toBeInstanceOf(JobCancelledError);
    await new Promise((r) => setTimeout(r, CANCEL_GRACE_MS + 100));
    // The slot is free again: nothing running, and a new job is answered by a fresh worker.
    expect(p.load.running).toBe(0);
    const report = await p.run('checks', { doc: l2h2Doc() });
    expect(report.findings.length).toBeGreaterThan(0);
  }, 120_000);

  it('an already cancelled signal is refused before any work', async () => {
    const p = pool(1, 4);
    const abort = new AbortController();
    abort.abort();
    await expect(p.run('checks', { doc: l2h2Doc() }, { signal: abort.signal })).rejects.toBeInstanceOf(JobCancelledError);
    expect(p.load).toEqual({ running: 0, waiting: 0 });
  });

  it('passes the search progress on, counting up to its total', async () => {
    const p = pool(1, 4);
    const seen: [number, number][] = [];
    const result = await p.run('proposals', { brief: { ...TYPICAL_BRIEF, bay: { source: 'template', template: 'l2h2' } } }, { onProgress: (d, t) => seen.push([d, t]) });
    expect(result.stats.checked).toBeGreaterThan(0);
    expect(seen.length).toBeGreaterThan(1);
    for (let i = 1; i < seen.length; i++) expect(seen[i][0]).toBeGreaterThanOrEqual(seen[i - 1][0]);
    const [lastDone, lastTotal] = seen[seen.length - 1];
    expect(lastDone).toBe(lastTotal);
  }, 120_000);
});
