// The work pool on real worker threads: jobs run off this thread, a full queue is refused at once
// with a retry time, a runaway job is stopped, and closing refuses what waits; warming starts the
// workers ahead of their first job (on stand-in workers).
import { EventEmitter } from 'node:events';
import { afterEach, describe, expect, it } from 'vitest';
import { WorkPool, WorkPoolBusyError, WorkPoolClosedError } from '@/lib/workers/pool';
import { stackedOnOneSpot } from './fixtures/adversarial-layouts';
import { l2h2Doc } from '../checks/helpers';

const pools: WorkPool[] = [];
function pool(size: number, queueLimit: number, timeoutMs = 60_000): WorkPool {
  const p = new WorkPool({ size, queueLimit, timeoutMs });
  pools.push(p);
  return p;
}
afterEach(async () => {
  await Promise.all(pools.splice(0).map((p) => p.close()));
});

describe('work pool', () => {
  it('runs the checks in a worker and answers the same report as in-thread', async () => {
    const { runChecks } = await import('@/lib/checks');
    const doc = l2h2Doc();
    const report = await pool(1, 4).run('checks', { doc });
    expect(report).toEqual(runChecks(doc));
  }, 60_000);

  it('keeps this thread free while a 5,000-module job runs', async () => {
    const p = pool(1, 4);
    await p.run('checks', { doc: l2h2Doc() }); // warm: the worker has started
    let ticks = 0;
    const timer = setInterval(() => ticks++, 10);
    const t0 = performance.now();
    await p.run('checks', { doc: stackedOnOneSpot() });
    const elapsed = performance.now() - t0;
    clearInterval(timer);
    // The timer kept firing while the job ran elsewhere: at least a third of the 10 ms ticks.
    expect(ticks).toBeGreaterThan(elapsed / 30);
  }, 60_000);

  it('refuses a job at once with a retry time when every worker is busy and the queue is full', async () => {
    const p = pool(1, 1);
    const doc = stackedOnOneSpot();
    const running = p.run('checks', { doc });
    const waiting = p.run('checks', { doc });
    const t0 = performance.now();
    const refused = await p.run('checks', { doc }).catch((e: unknown) => e);
    expect(performance.now() - t0).toBeLessThan(100);
    expect(refused).toBeInstanceOf(WorkPoolBusyError);
    expect((refused as WorkPoolBusyError).retryAfterSeconds).toBeGreaterThanOrEqual(1);
    await expect(running).resolves.toMatchObject({ ok: false });
    await expect(waiting).resolves.toMatchObject({ ok: false });
  }, 60_000);

  it('stops a job that runs past the time limit, and the pool keeps working', async () => {
    const p = pool(1, 2, 200);
    const slow = await p.run('checks', { doc: stackedOnOneSpot() }).catch((e: unknown) => e); // cold start + 5,000 modules: well over 200 ms
    expect(slow).toBeInstanceOf(WorkPoolBusyError);
    expect(p.load).toEqual({ running: 0, waiting: 0 });
  }, 60_000);

  it('closing refuses waiting jobs and later ones', async () => {
    const p = pool(1, 4);
    const doc = stackedOnOneSpot();
    const first = p.run('checks', { doc }).catch((e: unknown) => e);
    const second = p.run('checks', { doc }).catch((e: unknown) => e);
    await p.close();
    expect(await second).toBeInstanceOf(WorkPoolClosedError);
    expect(await first).toBeInstanceOf(WorkPoolClosedError);
    await expect(p.run('checks', { doc })).rejects.toBeInstanceOf(WorkPoolClosedError);
  }, 60_000);
});

describe('warming the work pool', () => {
  /** A stand-in worker thread that answers every job at once with its name. */
  function fakeWorker() {
    const w = new EventEmitter() as EventEmitter & { unref(): void; terminate(): Promise<number>; postMessage(m: { id: number; name: string }): void };
    w.unref = () => undefined;
    w.terminate = async () => 0;
    w.postMessage = (m) => queueMicrotask(() => w.emit('message', { id: m.id, ok: true, output: m.name }));
    return w;
  }

  it('starts every worker at once, and jobs then run on them without starting more', async () => {
    let started = 0;
    const p = new WorkPool({ size: 2, queueLimit: 4, timeoutMs: 60_000 }, () => {
      started++;
      return fakeWorker() as never;
    });
    pools.push(p);
    expect(started).toBe(0);
    p.warm();
    expect(started).toBe(2);
    p.warm(); // already running: nothing more
    expect(started).toBe(2);
    await expect(Promise.all([p.run('checks', { doc: l2h2Doc() }), p.run('checks', { doc: l2h2Doc() })])).resolves.toEqual(['checks', 'checks']);
    expect(started).toBe(2);
  });

  it('starts nothing once closed', async () => {
    let started = 0;
    const p = new WorkPool({ size: 2, queueLimit: 4, timeoutMs: 60_000 }, () => {
      started++;
      return fakeWorker() as never;
    });
    await p.close();
    p.warm();
    expect(started).toBe(0);
  });
});
