// The report a page begins for the document it opens with (server/api/checks-on-open.ts): the
// same report the checks route gives, counted against the caller's checks budget, and null —
// never a failed page — when that budget is spent or the job fails.
import { afterAll, afterEach, describe, expect, it, vi } from 'vitest';
import { checksForOpening, checksOnOpen, primeChecks, resetChecksOnOpen, settledWithin } from '@/server/api/checks-on-open';
import { runChecks } from '@/lib/checks';
import { closeWorkPool } from '@/lib/workers/pool';
import * as pool from '@/lib/workers/pool';
import { l2h2Doc, mod } from '../checks/helpers';

afterEach(() => {
  resetChecksOnOpen();
  vi.restoreAllMocks();
});
afterAll(() => closeWorkPool());

const doc = l2h2Doc({ modules: [mod({ id: 'bed', kind: 'bed-platform', x: 1400, y: 0, length: 1900, width: 1400, height: 600 })] });

describe('checks on opening a page', () => {
  it('is the report of the document with the studio’s defaults, worked in the pool', async () => {
    const defaults = { walkwayMin: 450 };
    await expect(checksOnOpen('user-1', doc, defaults)).resolves.toEqual(runChecks(doc, { studioDefaults: defaults }));
  }, 60_000);

  it('counts against the caller’s budget: a burst of 20, then null until it refills', async () => {
    const run = vi.spyOn(pool, 'runJob').mockResolvedValue({ ok: true, findings: [] } as never);
    const answers = await Promise.all(Array.from({ length: 21 }, () => checksOnOpen('user-2', doc, {})));
    expect(answers.filter((a) => a === null)).toHaveLength(1);
    expect(run).toHaveBeenCalledTimes(20);
    // Another caller has a budget of their own.
    await expect(checksOnOpen('user-3', doc, {})).resolves.not.toBeNull();
  });

  it('resolves to null when the work pool refuses or the job fails', async () => {
    vi.spyOn(pool, 'runJob').mockRejectedValue(new pool.WorkPoolBusyError(2));
    await expect(checksOnOpen('user-4', doc, {})).resolves.toBeNull();
  });

  it('a page waits a moment for the report: ready in time, the report itself goes in the page', async () => {
    const defaults = { walkwayMin: 450 };
    // A generous wait, so a loaded machine still finishes the job in it.
    const { checks } = await checksForOpening('user-5', doc, defaults, 30_000);
    expect(checks).not.toBeInstanceOf(Promise);
    expect(checks).toEqual(runChecks(doc, { studioDefaults: defaults }));
  }, 60_000);

  it('not ready in time, the page goes without it and the report follows as a promise', async () => {
    vi.useFakeTimers();
    try {
      let finish!: (r: null) => void;
      const slow = new Promise<null>((resolve) => (finish = resolve));
      const waiting = settledWithin(slow, 100);
      await vi.advanceTimersByTimeAsync(99);
      let settled = false;
      void waiting.then(() => (settled = true));
      await Promise.resolve();
      expect(settled).toBe(false);
      await vi.advanceTimersByTimeAsync(1);
      const got = await waiting; // before `slow` settles: the page is not held up
      expect(got).toEqual({ ready: false, promise: slow });
      finish(null);
      await expect(slow).resolves.toBeNull();
      // Settled within the wait: the value, and no timer left behind.
      await expect(settledWithin(Promise.resolve('report'), 100)).resolves.toEqual({ ready: true, value: 'report' });
      expect(vi.getTimerCount()).toBe(0);
    } finally {
      vi.useRealTimers();
    }
  });

  it('primes every thread of the pool with one checks run at start-up, and a failed run does not fail the start', async () => {
    const run = vi.fn().mockResolvedValueOnce({ ok: true, findings: [] }).mockRejectedValueOnce(new Error('a thread stopped'));
    const fake = { size: 2, run } as unknown as pool.WorkPool;
    await expect(primeChecks(fake)).resolves.toBeUndefined();
    expect(run).toHaveBeenCalledTimes(2);
    for (const [name, input] of run.mock.calls) {
      expect(name).toBe('checks');
      // A real layout, so the run goes through every rule.
      expect(input.doc.modules.length).toBeGreaterThan(3);
    }
  });
});
