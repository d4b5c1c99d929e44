// Pan and zoom shown as one moved picture until the gesture ends (components/editor/canvas/
// viewPreview.ts). Plain geometry worked by hand; no outside source is involved.
import { describe, expect, it, vi } from 'vitest';
import { createViewPreview, cssTransform, previewTransform } from '@/components/editor/canvas/viewPreview';
import type { Viewport } from '@/components/editor/geometry/viewport';
import { px } from '@/components/editor/types';

const committed: Viewport = { scale: 0.2, originX: px(100), originY: px(50), width: px(800), height: px(600) };

describe('previewTransform', () => {
  it('is the identity when nothing moved', () => {
    expect(previewTransform(committed, committed)).toEqual({ x: 0, y: 0, scale: 1 });
  });

  it('maps the committed drawing onto the live view: zoom 2× about (300, 200)', () => {
    // Zooming 2× about the screen point (300, 200): scale 0.4 px/mm, and the origin moves away
    // from that point by twice its distance: x 300 − 2 × 200 = −100, y 200 − 2 × 150 = −100.
    const live: Viewport = { ...committed, scale: 0.4, originX: px(-100), originY: px(-100) };
    const t = previewTransform(committed, live);
    expect(t.scale).toBeCloseTo(2, 12);
    expect(t.x).toBeCloseTo(-300, 9);
    expect(t.y).toBeCloseTo(-200, 9);
    // The world point (1000, 500) mm is drawn at (300, 150) for the committed view and belongs at
    // (−100 + 400, −100 + 200) = (300, 100) in the live one; the stage carries it there.
    expect(2 * 300 + t.x).toBeCloseTo(300, 9);
    expect(2 * 150 + t.y).toBeCloseTo(100, 9);
  });

  it('moves the picture by the pan alone', () => {
    const live: Viewport = { ...committed, originX: px(130), originY: px(10) };
    expect(previewTransform(committed, live)).toEqual({ x: 30, y: -40, scale: 1 });
  });
});

describe('createViewPreview', () => {
  function harness() {
    let store = committed;
    const frames: (() => void)[] = [];
    const style = { transform: '', transformOrigin: '' };
    const stage = { container: () => ({ style }), draw: vi.fn() };
    const announce = vi.fn();
    const commitTo = vi.fn((v: Viewport) => void (store = v));
    const view = createViewPreview({
      committed: () => store,
      commitTo,
      stage: () => stage,
      announce,
      frame: (cb) => frames.push(cb),
      cancelFrame: (id) => void (frames[id - 1] = () => undefined),
    });
    const runFrames = () => frames.splice(0).forEach((f) => f());
    return { view, frames, runFrames, stage, style, announce, commitTo, store: () => store };
  }

  it('paints once a frame however many steps come, and leaves the store alone', () => {
    const h = harness();
    h.view.show({ ...committed, originX: px(110) });
    h.view.show({ ...committed, originX: px(120) });
    expect(h.frames).toHaveLength(1);
    expect(h.announce).toHaveBeenCalledTimes(2);
    h.runFrames();
    // Moved 20 px right as a picture: nothing redrawn.
    expect(h.style.transform).toBe('matrix(1, 0, 0, 1, 20, 0)');
    expect(h.style.transformOrigin).toBe('0 0');
    expect(h.stage.draw).not.toHaveBeenCalled();
    expect(h.commitTo).not.toHaveBeenCalled();
    expect(h.view.current().originX).toBe(120);
    expect(h.store()).toBe(committed);
  });

  it('commits the view on show once, then draws it and puts the picture back in one frame', () => {
    const h = harness();
    const live: Viewport = { ...committed, scale: 0.4 };
    h.view.show(live);
    h.runFrames();
    // Twice the scale with the origin kept: the picture grows 2× about its own (100, 50).
    expect(h.style.transform).toBe(cssTransform({ x: 100 - 100 * 2, y: 50 - 50 * 2, scale: 2 }));
    h.view.commit();
    expect(h.commitTo).toHaveBeenCalledExactlyOnceWith(live);
    // Until the next frame the moved picture stays: the store's view is drawn in that frame.
    expect(h.style.transform).not.toBe('');
    h.runFrames();
    expect(h.stage.draw).toHaveBeenCalledTimes(1);
    expect(h.style.transform).toBe('');
    expect(h.view.pending()).toBe(false);
    expect(h.view.current()).toBe(live);
    h.view.commit(); // nothing pending: nothing more
    expect(h.commitTo).toHaveBeenCalledTimes(1);
  });

  it('a paint that was due when the gesture ended moves nothing', () => {
    const h = harness();
    h.view.show({ ...committed, originY: px(70) });
    h.view.commit();
    h.runFrames();
    expect(h.style.transform).toBe('');
  });

  it('a new gesture before the settling frame keeps its own picture', () => {
    const h = harness();
    h.view.show({ ...committed, originY: px(70) });
    h.view.commit();
    h.view.show({ ...h.store(), originY: px(90) });
    h.runFrames();
    expect(h.stage.draw).not.toHaveBeenCalled();
    expect(h.style.transform).toBe('matrix(1, 0, 0, 1, 0, 20)');
  });

  it('discarding puts the stage back, keeps the store and announces its view again', () => {
    const h = harness();
    h.view.show({ ...committed, scale: 0.5 });
    h.runFrames();
    h.view.discard();
    h.runFrames();
    expect(h.commitTo).not.toHaveBeenCalled();
    expect(h.style.transform).toBe('');
    expect(h.announce).toHaveBeenLastCalledWith(committed);
    expect(h.view.current()).toBe(committed);
  });
});
