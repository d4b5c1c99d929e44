// The report a page begins for the document it opens with (server/api/checks-on-open.ts): the
// same report the checks route gives, counted against the caller's checks budget, and null —
// never a failed page — when that budget is spent or the job fails.
import { afterAll, afterEach, describe, expect, it, vi } from 'vitest';
import { checksOnOpen, resetChecksOnOpen } from '@/server/api/checks-on-open';
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
});
