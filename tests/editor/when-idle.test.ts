import { afterEach, describe, expect, it, vi } from 'vitest';
import { whenIdle } from '@/components/ui/whenIdle';

afterEach(() => {
  vi.unstubAllGlobals();
  vi.useRealTimers();
});

describe('whenIdle', () => {
  it('does nothing on the server', () => {
    const fn = vi.fn();
    const off = whenIdle(fn);
    off();
    expect(fn).not.toHaveBeenCalled();
  });

  it('runs in an idle callback with the deadline given, and can be called off', () => {
    const queued = new Map<number, () => void>();
    let next = 1;
    const requestIdleCallback = vi.fn((cb: () => void, _opts: { timeout: number }) => (queued.set(next, cb), next++));
    const cancelIdleCallback = vi.fn((id: number) => void queued.delete(id));
    vi.stubGlobal('window', { requestIdleCallback, cancelIdleCallback });
    const fn = vi.fn();
    whenIdle(fn, 1500);
    expect(requestIdleCallback.mock.calls[0][1]).toEqual({ timeout: 1500 });
    expect(fn).not.toHaveBeenCalled();
    for (const cb of queued.values()) cb();
    expect(fn).toHaveBeenCalledTimes(1);

    const later = vi.fn();
    const off = whenIdle(later);
    off();
    expect(cancelIdleCallback).toHaveBeenCalledTimes(1);
    expect([...queued.keys()]).toEqual([1]); // only the first one's callback was ever left
  });

  it('waits a moment where there is no idle callback (Safari), and can be called off', () => {
    vi.useFakeTimers();
    vi.stubGlobal('window', {});
    const fn = vi.fn();
    whenIdle(fn);
    vi.advanceTimersByTime(499);
    expect(fn).not.toHaveBeenCalled();
    vi.advanceTimersByTime(1);
    expect(fn).toHaveBeenCalledTimes(1);
    const off = whenIdle(fn);
    off();
    vi.advanceTimersByTime(1000);
    expect(fn).toHaveBeenCalledTimes(1);
  });
});
