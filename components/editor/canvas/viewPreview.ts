/**
 * Pan and zoom gestures (a finger or the middle button dragging the plan, two fingers pinching,
 * the wheel) move the whole picture many times a second. Redrawing every module for each step
 * costs a frame on a tablet's slower processor, so a gesture is shown by moving the drawn canvas as
 * one picture (a CSS transform, which the browser composites without redrawing), and the store's
 * viewport changes once, when the gesture ends; the plan is then redrawn at its new scale (labels
 * and line weights fitted again) and the picture put back in the same frame.
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

/** What the preview needs of a Konva stage. */
export interface PreviewStage {
  container(): { style: { transform: string; transformOrigin: string } };
  /** Draws every layer now. */
  draw(): unknown;
}

export function cssTransform(t: StageTransform): string {
  return `matrix(${t.scale}, 0, 0, ${t.scale}, ${t.x}, ${t.y})`;
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
    const style = stage.container().style;
    style.transformOrigin = '0 0';
    style.transform = cssTransform(previewTransform(opts.committed(), live));
  }

  /**
   * The store has its new view; React hands it to the layers before the next frame (a store
   * update from an event is rendered in a microtask). In that frame the stage draws it and the
   * picture goes back where it belongs, so no frame shows the old drawing unmoved.
   */
  function settle() {
    frame(() => {
      const stage = opts.stage();
      if (!stage || live) return; // gone, or a new gesture is on show
      stage.draw();
      stage.container().style.transform = '';
    });
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
      opts.commitTo(next);
      settle();
    },
    discard() {
      if (scheduled !== null) cancelFrame(scheduled);
      scheduled = null;
      if (!live) return;
      live = null;
      opts.announce?.(opts.committed());
      settle();
    },
    pending: () => live !== null,
    dispose() {
      if (scheduled !== null) cancelFrame(scheduled);
      scheduled = null;
      live = null;
    },
  };
}
