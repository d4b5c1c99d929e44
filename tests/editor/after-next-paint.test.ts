// Work an edit sets off waits for the paint that answers the key (afterNextPaint); a field's edit
// waiting so (commitAfterNextPaint) is applied first by whatever reads the document before then
// (runWaitingCommits): the edit is neither lost nor applied twice.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { afterNextPaint, commitAfterNextPaint, runWaitingCommits } from '@/components/ui/afterNextPaint';
import { moduleFormSchema } from '@/components/editor/panels/moduleForm';

function fakeFrames() {
  vi.useFakeTimers();
  const frames: (() => void)[] = [];
  vi.stubGlobal('requestAnimationFrame', (cb: () => void) => frames.push(cb));
  vi.stubGlobal('cancelAnimationFrame', (id: number) => {
    frames[id - 1] = () => {};
  });
  return frames;
}

describe('afterNextPaint', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    vi.useRealTimers();
  });

  it('runs in the next task where nothing paints (node)', () => {
    vi.useFakeTimers();
    const fn = vi.fn();
    afterNextPaint(fn);
    expect(fn).not.toHaveBeenCalled();
    vi.runAllTimers();
    expect(fn).toHaveBeenCalledTimes(1);
  });

  it('runs after the next animation frame and the task after it, not before', () => {
    const frames = fakeFrames();
    const fn = vi.fn();
    afterNextPaint(fn);
    vi.runAllTimers();
    expect(fn).not.toHaveBeenCalled();
    frames.shift()!(); // the frame before the paint
    expect(fn).not.toHaveBeenCalled();
    vi.runAllTimers(); // the task after the paint
    expect(fn).toHaveBeenCalledTimes(1);
  });

  it('can be called off before the frame and after it', () => {
    const frames = fakeFrames();
    const before = vi.fn();
    afterNextPaint(before)();
    const after = vi.fn();
    const callOff = afterNextPaint(after);
    for (const f of frames) f();
    callOff();
    vi.runAllTimers();
    expect(before).not.toHaveBeenCalled();
    expect(after).not.toHaveBeenCalled();
  });

  it('runWaitingCommits applies waiting edits now, in order, and each once', () => {
    const frames = fakeFrames();
    const seen: string[] = [];
    commitAfterNextPaint(() => seen.push('first'));
    commitAfterNextPaint(() => seen.push('second'));
    runWaitingCommits();
    expect(seen).toEqual(['first', 'second']);
    for (const f of frames) f();
    vi.runAllTimers();
    runWaitingCommits();
    expect(seen).toEqual(['first', 'second']);
  });

  it('an edit nobody read early is applied after the paint, once', () => {
    const frames = fakeFrames();
    const fn = vi.fn();
    commitAfterNextPaint(fn);
    for (const f of frames) f();
    vi.runAllTimers();
    runWaitingCommits();
    expect(fn).toHaveBeenCalledTimes(1);
  });
});

describe('the Details form schema', () => {
  it('is built once per unit and reads the same', () => {
    expect(moduleFormSchema('mm')).toBe(moduleFormSchema('mm'));
    expect(moduleFormSchema('cm')).not.toBe(moduleFormSchema('mm'));
    expect(moduleFormSchema('cm').shape.length.safeParse('120')).toEqual({ success: true, data: 1200 });
  });
});
