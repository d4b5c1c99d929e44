/**
 * Pan and zoom gestures (a finger or the middle button dragging the plan, two fingers pinching,
 * the wheel) move the whole picture many times a second. Redrawing every module through React
 * for each step costs a frame on a tablet's slower processor, so a gesture is shown by moving the
 * Konva stage as one picture, and the store's viewport changes once, when the gesture ends; the
 * plan is then redrawn at its new scale (labels and line weights fitted again).
 *
 * `previewTransform` is pure: the stage position and scale that turn the picture drawn for the
 * committed viewport into the one the live viewport would draw. `createViewPreview` holds the live
 * viewport, paints it at most once a frame, and commits it. Must never write the document.
 */
import type { Viewport } from '../geometry/viewport';

export interface StageTransform {
  x: number;
  y: number;
  scale: number;
}

/**
 * A world point p is at `c.origin + p · c.scale` in the committed drawing and belongs at
 * `l.origin + p · l.scale`; with k = l.scale / c.scale the stage maps s ↦ k·s + (l.origin − k·c.origin).
 */
export function previewTransform(committed: Viewport, live: Viewport): StageTransform {
  const scale = live.scale / committed.scale;
  return { x: live.originX - committed.originX * scale, y: live.originY - committed.originY * scale, scale };
}

export interface PreviewStage {
  setAttrs(attrs: { x: number; y: number; scaleX: number; scaleY: number }): unknown;
  batchDraw(): unknown;
}

export interface ViewPreview {
  /** The viewport on show: the live one during a gesture, else the committed one. */
  current(): Viewport;
  /** Shows `next` (from the next animation frame) without touching the store. */
  show(next: Viewport): void;
  /** Ends the gesture: the store takes the live viewport and the stage its identity transform. */
  commit(): void;
  /** Drops the live viewport (the store's view was changed by something else: fit, a zoom key). */
  discard(): void;
  /** True while a live viewport waits to be committed. */
  pending(): boolean;
  dispose(): void;
}

export function createViewPreview(opts: {
  committed: () => Viewport;
  commitTo: (v: Viewport) => void;
  stage: () => PreviewStage | null;
  /** Tells the page which scale is on show (the plan's `data-scale`), for tests and the benchmark. */
  announce?: (v: Viewport) => void;
  frame?: (cb: () => void) => number;
  cancelFrame?: (id: number) => void;
}): ViewPreview {
  const frame = opts.frame ?? ((cb: () => void) => requestAnimationFrame(cb));
  const cancelFrame = opts.cancelFrame ?? ((id: number) => cancelAnimationFrame(id));
  let live: Viewport | null = null;
  let scheduled: number | null = null;

  function paint() {
    scheduled = null;
    const stage = opts.stage();
    if (!live || !stage) return;
    const t = previewTransform(opts.committed(), live);
    stage.setAttrs({ x: t.x, y: t.y, scaleX: t.scale, scaleY: t.scale });
    stage.batchDraw();
  }

  return {
    current: () => live ?? opts.committed(),
    show(next) {
      live = next;
      opts.announce?.(next);
      if (scheduled === null) scheduled = frame(paint);
    },
    commit() {
      if (scheduled !== null) cancelFrame(scheduled);
      scheduled = null;
      if (!live) return;
      const next = live;
      live = null;
      const stage = opts.stage();
      stage?.setAttrs({ x: 0, y: 0, scaleX: 1, scaleY: 1 });
      opts.commitTo(next);
      stage?.batchDraw();
    },
    discard() {
      if (scheduled !== null) cancelFrame(scheduled);
      scheduled = null;
      if (!live) return;
      live = null;
      const stage = opts.stage();
      stage?.setAttrs({ x: 0, y: 0, scaleX: 1, scaleY: 1 });
      stage?.batchDraw();
      opts.announce?.(opts.committed());
    },
    pending: () => live !== null,
    dispose() {
      if (scheduled !== null) cancelFrame(scheduled);
      scheduled = null;
      live = null;
    },
  };
}
