'use client';
/**
 * Pointer input on the plan: click / shift-click / marquee selection, move by drag, resize by
 * handles, zoom by wheel and pinch, pan by space-drag or the middle button, drops from the Parts
 * shelf, and the context menu. Hit testing is done in mm against the store (no Konva hit graph).
 * Pan and zoom are shown by moving the stage as one picture and reach the store when the gesture
 * ends (viewPreview.ts), so a tablet keeps its frame rate while two fingers zoom. A drag or resize
 * is committed just after the frame that shows where it was let go (the drag layer still draws
 * it there), so the release paints at once and the document, plan and findings follow; a drop
 * from the Parts shelf is placed the same way, just after the frame that ends the drag.
 * Each gesture is begun, dragged and committed through store actions; Escape (a command)
 * cancels it, and the rest of that pointer stroke is ignored. Must never write the document
 * directly.
 */
import { useEffect, useRef, type RefObject } from 'react';
import { toast } from '@/components/ui/toast';
import { KINDS } from '@/lib/layout/kinds';
import type { ModuleKind } from '@/lib/layout/schema';
import type { EditorStore } from '../store/editorStore';
import { toWorld, screenToMm, panBy, zoomAt } from '../geometry/viewport';
import { createViewPreview, type PreviewStage } from './viewPreview';
import { cursorForHandle, drawOrder, handleAt, moduleAt } from '../geometry/hitTest';
import { HANDLE_PX } from './OverlayLayer';
import { isTypingTarget } from '../commands/keyboard';
import { commitAfterNextPaint, runWaitingCommits } from '@/components/ui/afterNextPaint';
import { inArrangement, modulesIn } from '@/lib/layout/bay';
import { openingAt, openingMarks, roofOpeningInside, type OpeningMark } from '../geometry/openingMarks';
import type { EditorState } from '../store/editorStore';

/** How near (screen px) a pointer must come to an opening's mark to take it; more for a finger. */
const OPENING_SLOP_PX = 5;
const TOUCH_OPENING_SLOP_PX = 14;

/** The opening under a plan point: a mark's edge first, a roof opening's inside only where no module is. */
function openingUnder(s: EditorState, x: number, y: number, touch: boolean): OpeningMark | undefined {
  if (s.doc.bay.openings.length === 0) return undefined;
  const px = 1 / s.viewport.scale;
  const marks = openingMarks(s.doc, px);
  // Over a module a finger gets no more reach than the mouse: the module under it wins.
  const onModule = !!moduleAt(drawOrder(modulesIn(s.doc, s.arrangement)), x, y);
  const hit = openingAt(marks, x, y, px, (touch && !onModule ? TOUCH_OPENING_SLOP_PX : OPENING_SLOP_PX) * px);
  if (hit) return hit;
  return onModule ? undefined : roofOpeningInside(marks, x, y);
}

export const KIND_DRAG_TYPE = 'application/x-baywright-kind';
/** The wheel's zoom reaches the store this long after its last step (common practice, no source). */
const WHEEL_SETTLE_MS = 150;
/** Pointer travel (px) before a press on a module becomes a drag rather than a click; a finger wobbles more than a mouse. */
const DRAG_START_PX = 3;
const TOUCH_DRAG_START_PX = 8;
/** A finger held this long on a module without moving opens its actions (common practice on touch screens, no source). */
export const LONG_PRESS_MS = 500;
/** Half the side of a resize handle's target for a finger: 44 × 44 CSS px (WCAG 2.2 SC 2.5.5 Target Size, enhanced). */
export const TOUCH_HANDLE_PX = 22;

type Stroke =
  | { mode: 'pan'; lastX: number; lastY: number }
  | { mode: 'press'; startX: number; startY: number; ids: string[]; hitId: string; shift: boolean; touch: boolean }
  | { mode: 'gesture'; startX: number; startY: number }
  | { mode: 'opening-press'; startX: number; startY: number; id: string; touch: boolean }
  | { mode: 'ignored' };

export function usePlanPointer(container: RefObject<HTMLDivElement | null>, api: EditorStore, onContextMenu: (x: number, y: number) => void, stage?: RefObject<PreviewStage | null>) {
  const stroke = useRef<Stroke | null>(null);
  const space = useRef(false);
  const touches = useRef(new Map<number, { x: number; y: number }>());
  const pinch = useRef<{ dist: number; midX: number; midY: number } | null>(null);
  const longPress = useRef<ReturnType<typeof setTimeout> | null>(null);

  useEffect(() => {
    const el = container.current;
    if (!el) return;
    const setStroke = (next: Stroke | null) => {
      stroke.current = next;
      el.setAttribute('data-stroke', next?.mode ?? 'none');
    };
    el.setAttribute('data-stroke', 'none');
    let committing = false;
    const view = createViewPreview({
      committed: () => api.getState().viewport,
      commitTo: (v) => {
        committing = true;
        try {
          api.getState().setViewport(v);
        } finally {
          committing = false;
        }
      },
      stage: () => stage?.current ?? null,
      announce: (v) => {
        el.setAttribute('data-scale', String(v.scale));
        el.setAttribute('data-origin', `${Math.round(v.originX)},${Math.round(v.originY)}`);
      },
    });
    let wheelSettle: ReturnType<typeof setTimeout> | null = null;
    const commitView = () => {
      if (wheelSettle) clearTimeout(wheelSettle);
      wheelSettle = null;
      view.commit();
    };
    // A released drag: committed after the next paint, or before anything else the person does.
    let releasedGesture = false;
    const commitReleased = () => {
      if (!releasedGesture) return;
      releasedGesture = false;
      report(api.getState().commitGesture());
    };
    // Anything still waiting for its paint (a drop from the shelf, a field's edit, a released drag),
    // in the order it was made: before the next press or key.
    const commitWaiting = () => {
      runWaitingCommits();
      commitReleased();
    };
    const commitAfterPaint = () => {
      releasedGesture = true;
      api.getState().releaseGesture(); // the save indicator says "Unsaved changes" until then
      requestAnimationFrame(() => setTimeout(commitReleased, 0));
    };
    // Fit, actual size or a resize while a wheel zoom settles: the store's new view wins.
    const unsubscribe = api.subscribe((st, prev) => {
      if (!committing && st.viewport !== prev.viewport && view.pending()) {
        if (wheelSettle) clearTimeout(wheelSettle);
        wheelSettle = null;
        view.discard();
      }
    });
    const local = (e: { clientX: number; clientY: number }) => {
      const r = el.getBoundingClientRect();
      return { x: e.clientX - r.left, y: e.clientY - r.top };
    };
    const world = (p: { x: number; y: number }) => toWorld(view.current(), p.x, p.y);
    const report = (r: { ok: boolean; error?: string }) => {
      if (!r.ok && r.error) toast.error(r.error);
    };
    const stopLongPress = () => {
      if (longPress.current) clearTimeout(longPress.current);
      longPress.current = null;
    };

    function hoverCursor(p: { x: number; y: number }) {
      const s = api.getState();
      if (space.current) return (el!.style.cursor = 'grab');
      const w = world(p);
      if (!s.readOnly && s.selection.length === 1) {
        const m = s.doc.modules.find((o) => o.id === s.selection[0] && inArrangement(o, s.arrangement));
        const h = m && handleAt(m, w.x, w.y, screenToMm(s.viewport, HANDLE_PX));
        if (h) return (el!.style.cursor = cursorForHandle(h));
      }
      const hit = openingUnder(s, w.x, w.y, false) ?? moduleAt(drawOrder(modulesIn(s.doc, s.arrangement)), w.x, w.y);
      el!.style.cursor = hit && !s.readOnly ? 'move' : hit ? 'pointer' : 'default';
    }

    function onPointerDown(e: PointerEvent) {
      commitReleased();
      // A new stroke starts from the view on show; a second finger carries on the first one's pan.
      if (view.pending() && !(e.pointerType === 'touch' && touches.current.size === 1)) commitView();
      if (e.pointerType === 'touch') {
        touches.current.set(e.pointerId, local(e));
        if (touches.current.size === 2) {
          stopLongPress();
          api.getState().cancelGesture();
          setStroke({ mode: 'ignored' });
          const [a, b] = [...touches.current.values()];
          pinch.current = { dist: Math.hypot(a.x - b.x, a.y - b.y), midX: (a.x + b.x) / 2, midY: (a.y + b.y) / 2 };
          return;
        }
      }
      el!.focus({ preventScroll: true });
      const p = local(e);
      if (e.button === 1 || (e.button === 0 && space.current)) {
        e.preventDefault();
        setStroke({ mode: 'pan', lastX: p.x, lastY: p.y });
        el!.setPointerCapture(e.pointerId);
        el!.style.cursor = 'grabbing';
        return;
      }
      if (e.button !== 0) return;
      const s = api.getState();
      const w = world(p);
      el!.setPointerCapture(e.pointerId);
      const touch = e.pointerType === 'touch';
      if (s.placing) {
        // A kind picked on the shelf by touch: this tap says where it goes.
        const kind = s.placing;
        s.setPlacing(null);
        report(s.addModule(kind, w));
        setStroke({ mode: 'ignored' });
        return;
      }
      if (!s.readOnly && s.selection.length === 1) {
        const m = s.doc.modules.find((o) => o.id === s.selection[0] && inArrangement(o, s.arrangement));
        const h = m && handleAt(m, w.x, w.y, screenToMm(s.viewport, touch ? TOUCH_HANDLE_PX : HANDLE_PX));
        if (m && h) {
          s.beginResize(m.id, h);
          setStroke({ mode: 'gesture', startX: w.x, startY: w.y });
          return;
        }
      }
      const opening = openingUnder(s, w.x, w.y, touch);
      if (opening) {
        s.selectOpening(opening.id);
        setStroke(s.readOnly ? { mode: 'ignored' } : { mode: 'opening-press', startX: w.x, startY: w.y, id: opening.id, touch });
        return;
      }
      const hit = moduleAt(drawOrder(modulesIn(s.doc, s.arrangement)), w.x, w.y);
      if (hit) {
        if (e.shiftKey) s.select([hit.id], 'toggle');
        else if (!s.selection.includes(hit.id)) s.select([hit.id]);
        const sel = api.getState().selection;
        setStroke(!s.readOnly && sel.includes(hit.id) ? { mode: 'press', startX: w.x, startY: w.y, ids: sel, hitId: hit.id, shift: e.shiftKey, touch } : { mode: 'ignored' });
        if (touch) {
          // Long-press: the module's actions, as a right-click gives them.
          stopLongPress();
          longPress.current = setTimeout(() => {
            longPress.current = null;
            const st = stroke.current;
            if (st && st.mode !== 'press' && st.mode !== 'ignored') return; // already dragging
            setStroke({ mode: 'ignored' });
            onContextMenu(p.x, p.y);
          }, LONG_PRESS_MS);
        }
        return;
      }
      if (touch) {
        // One finger on empty plan pans; marquee selection is for the mouse.
        setStroke({ mode: 'pan', lastX: p.x, lastY: p.y });
        return;
      }
      s.beginMarquee(w.x, w.y, e.shiftKey);
      setStroke({ mode: 'gesture', startX: w.x, startY: w.y });
    }

    function onPointerMove(e: PointerEvent) {
      if (e.pointerType === 'touch' && touches.current.has(e.pointerId)) {
        touches.current.set(e.pointerId, local(e));
        if (pinch.current && touches.current.size === 2) {
          const [a, b] = [...touches.current.values()];
          const dist = Math.hypot(a.x - b.x, a.y - b.y);
          const midX = (a.x + b.x) / 2, midY = (a.y + b.y) / 2;
          const panned = panBy(view.current(), midX - pinch.current.midX, midY - pinch.current.midY);
          view.show(pinch.current.dist > 0 ? zoomAt(panned, dist / pinch.current.dist, midX, midY) : panned);
          pinch.current = { dist, midX, midY };
          return;
        }
      }
      const p = local(e);
      const st = stroke.current;
      if (!st) return hoverCursor(p);
      const s = api.getState();
      if (st.mode === 'pan') {
        view.show(panBy(view.current(), p.x - st.lastX, p.y - st.lastY));
        setStroke({ ...st, lastX: p.x, lastY: p.y });
        return;
      }
      if (st.mode === 'ignored') return;
      const w = world(p);
      if (st.mode === 'press' || st.mode === 'opening-press') {
        const moved = Math.hypot(w.x - st.startX, w.y - st.startY) * s.viewport.scale;
        if (moved < (st.touch ? TOUCH_DRAG_START_PX : DRAG_START_PX)) return;
        stopLongPress();
        if (st.mode === 'press') s.beginMove(st.ids);
        else s.beginOpeningMove(st.id);
        setStroke({ mode: 'gesture', startX: st.startX, startY: st.startY });
      } else if (!s.gesture) {
        // Escape dropped the gesture: ignore the rest of this stroke.
        setStroke({ mode: 'ignored' });
        return;
      }
      api.getState().dragTo(w.x - st.startX, w.y - st.startY);
    }

    function onPointerUp(e: PointerEvent) {
      stopLongPress();
      if (e.pointerType === 'touch') {
        touches.current.delete(e.pointerId);
        if (touches.current.size < 2) pinch.current = null;
      }
      const st = stroke.current;
      setStroke(null);
      if (view.pending() && touches.current.size < 2) commitView();
      if (el!.hasPointerCapture(e.pointerId)) el!.releasePointerCapture(e.pointerId);
      if (st?.mode === 'gesture') commitAfterPaint();
      // A plain click (no drag) on one of several selected modules selects just that one.
      if (st?.mode === 'press' && !st.shift && st.ids.length > 1) api.getState().select([st.hitId]);
      hoverCursor(local(e));
    }

    function onPointerCancel(e: PointerEvent) {
      stopLongPress();
      touches.current.delete(e.pointerId);
      pinch.current = null;
      setStroke(null);
      if (touches.current.size < 2) commitView();
      api.getState().cancelGesture();
    }

    function onWheel(e: WheelEvent) {
      e.preventDefault();
      const p = local(e);
      // Pinch on a trackpad arrives as ctrl+wheel with small deltas.
      const k = e.ctrlKey ? 0.01 : 0.0015;
      const delta = e.deltaMode === 1 ? e.deltaY * 16 : e.deltaY;
      view.show(zoomAt(view.current(), Math.exp(-delta * k), p.x, p.y));
      if (wheelSettle) clearTimeout(wheelSettle);
      wheelSettle = setTimeout(commitView, WHEEL_SETTLE_MS);
    }

    function onContext(e: MouseEvent) {
      e.preventDefault();
      const p = local(e);
      const s = api.getState();
      const w = world(p);
      const hit = moduleAt(drawOrder(modulesIn(s.doc, s.arrangement)), w.x, w.y);
      if (hit && !s.selection.includes(hit.id)) s.select([hit.id]);
      onContextMenu(p.x, p.y);
    }

    function onDragOver(e: DragEvent) {
      if (api.getState().readOnly) return;
      if (e.dataTransfer?.types.includes(KIND_DRAG_TYPE)) {
        e.preventDefault();
        e.dataTransfer.dropEffect = 'copy';
      }
    }

    function onDrop(e: DragEvent) {
      const kind = e.dataTransfer?.getData(KIND_DRAG_TYPE);
      if (!kind) return;
      e.preventDefault();
      if (!Object.prototype.hasOwnProperty.call(KINDS, kind)) return void toast.error(`Unknown module kind "${kind}".`);
      const w = world(local(e));
      el!.focus({ preventScroll: true });
      // The drop is answered by the next paint (the end of the drag, the plan focused); the module
      // is placed in the task after it, or before anything else the person does (runWaitingCommits).
      commitAfterNextPaint(() => report(api.getState().addModule(kind as ModuleKind, w)));
    }

    // Keyboard commands (zoom, fit, nudges) work on the store's view: give it the one on show
    // first (capturing, so before any command's listener).
    function commitBeforeKey() {
      commitWaiting();
      if (view.pending()) commitView();
    }
    function onKeyDown(e: KeyboardEvent) {
      if (e.key === ' ' && !isTypingTarget(e.target as HTMLElement)) {
        if (!space.current) {
          space.current = true;
          el!.style.cursor = 'grab';
        }
        if (e.target === el || el!.contains(e.target as Node) || e.target === document.body) e.preventDefault();
      }
    }
    function onKeyUp(e: KeyboardEvent) {
      if (e.key === ' ') {
        space.current = false;
        el!.style.cursor = 'default';
      }
    }

    el.addEventListener('pointerdown', onPointerDown);
    el.addEventListener('pointermove', onPointerMove);
    el.addEventListener('pointerup', onPointerUp);
    el.addEventListener('pointercancel', onPointerCancel);
    el.addEventListener('wheel', onWheel, { passive: false });
    el.addEventListener('contextmenu', onContext);
    el.addEventListener('dragover', onDragOver);
    el.addEventListener('drop', onDrop);
    window.addEventListener('keydown', commitBeforeKey, true);
    window.addEventListener('pointerdown', commitWaiting, true); // a toolbar button (Undo) sees the drag or drop committed
    window.addEventListener('keydown', onKeyDown);
    window.addEventListener('keyup', onKeyUp);
    return () => {
      el.removeEventListener('pointerdown', onPointerDown);
      el.removeEventListener('pointermove', onPointerMove);
      el.removeEventListener('pointerup', onPointerUp);
      el.removeEventListener('pointercancel', onPointerCancel);
      el.removeEventListener('wheel', onWheel);
      el.removeEventListener('contextmenu', onContext);
      el.removeEventListener('dragover', onDragOver);
      el.removeEventListener('drop', onDrop);
      window.removeEventListener('keydown', commitBeforeKey, true);
      window.removeEventListener('pointerdown', commitWaiting, true);
      window.removeEventListener('keydown', onKeyDown);
      window.removeEventListener('keyup', onKeyUp);
      stopLongPress();
      if (wheelSettle) clearTimeout(wheelSettle);
      commitReleased();
      unsubscribe();
      view.dispose();
    };
  }, [container, api, onContextMenu, stage]);
}
