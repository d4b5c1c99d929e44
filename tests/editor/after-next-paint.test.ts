// A field's commit waits for the paint that answers the key (afterNextPaint), and whatever reads
// the document first runs it (runWaitingNow): the edit is neither lost nor applied twice.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { afterNextPaint, runWaitingNow } from '@/components/ui/afterNextPaint';
import { moduleFormSchema } from '@/components/editor/panels/moduleForm';

describe('afterNextPaint', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    vi.useRealTimers();
  });

  it('runs at once where there is no window (server rendering)', () => {
    const fn = vi.fn();
    afterNextPaint(fn);
    expect(fn).toHaveBeenCalledTimes(1);
  });

  it('runs after the next animation frame and the task after it, not before', () => {
    vi.useFakeTimers();
    const frames: (() => void)[] = [];
    vi.stubGlobal('window', { requestAnimationFrame: (cb: () => void) => frames.push(cb) });
    const fn = vi.fn();
    afterNextPaint(fn);
    expect(fn).not.toHaveBeenCalled();
    frames.shift()!(); // the frame before the paint
    expect(fn).not.toHaveBeenCalled();
    vi.runAllTimers(); // the task after the paint
    expect(fn).toHaveBeenCalledTimes(1);
  });

  it('runWaitingNow runs what waits, in order, and each once', () => {
    vi.useFakeTimers();
    const frames: (() => void)[] = [];
    vi.stubGlobal('window', { requestAnimationFrame: (cb: () => void) => frames.push(cb) });
    const seen: string[] = [];
    afterNextPaint(() => seen.push('first'));
    afterNextPaint(() => seen.push('second'));
    runWaitingNow();
    expect(seen).toEqual(['first', 'second']);
    for (const f of frames) f();
    vi.runAllTimers();
    runWaitingNow();
    expect(seen).toEqual(['first', 'second']);
  });
});

describe('the Details form schema', () => {
  it('is built once per unit and reads the same', () => {
    expect(moduleFormSchema('mm')).toBe(moduleFormSchema('mm'));
    expect(moduleFormSchema('cm')).not.toBe(moduleFormSchema('mm'));
    const read = moduleFormSchema('cm').shape.length.safeParse('120');
    expect(read).toEqual({ success: true, data: 1200 });
  });
});
