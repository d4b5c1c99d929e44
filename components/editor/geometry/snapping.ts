/**
 * Snapping for moves and resizes: to the lining and bare walls, to wheel-arch faces, to other
 * modules' edges (those win, within a few screen pixels) and otherwise to the grid step. Returns
 * the snapped offset and the guide lines to show. Pure math on mm; never reads the store.
 */
import type { LayoutDoc, Arrangement } from '@/lib/layout';
import { archBoxes, footprintRect, inArrangement, linedInterior, type Footprint } from '@/lib/layout/bay';
import type { Rect } from '@/lib/geometry/rect';

export const GRID_STEPS = [10, 50, 100] as const;
export type GridStep = (typeof GRID_STEPS)[number];

/** A line to draw while snapping: along `axis` at `at`, spanning `from`..`to` on the other axis. */
export interface SnapGuide {
  axis: 'x' | 'y';
  at: number;
  from: number;
  to: number;
}

export interface SnapTargets {
  /** Candidate x values (lines across the bay) and y values (lines along it), with their extents. */
  xs: { at: number; from: number; to: number }[];
  ys: { at: number; from: number; to: number }[];
}

export interface SnapOptions {
  enabled: boolean;
  step: GridStep;
  /** How close, in mm, an edge must come to a target to stick to it (a few px at current zoom). */
  threshold: number;
}

/** Edges worth sticking to, leaving out the modules being moved. */
export function snapTargets(doc: LayoutDoc, arrangement: Arrangement, exclude: ReadonlySet<string>): SnapTargets {
  const lined = linedInterior(doc);
  const { length, width } = doc.bay;
  const xs: SnapTargets['xs'] = [
    { at: 0, from: 0, to: width },
    { at: length, from: 0, to: width },
  ];
  const ys: SnapTargets['ys'] = [
    { at: lined.y0, from: 0, to: length },
    { at: lined.y1, from: 0, to: length },
    { at: 0, from: 0, to: length },
    { at: width, from: 0, to: length },
  ];
  for (const a of archBoxes(doc)) addRect(a.rect);
  for (const m of doc.modules) {
    if (exclude.has(m.id) || !inArrangement(m, arrangement)) continue;
    addRect(footprintRect(m));
  }
  return { xs, ys };

  function addRect(r: Rect) {
    xs.push({ at: r.x0, from: r.y0, to: r.y1 }, { at: r.x1, from: r.y0, to: r.y1 });
    ys.push({ at: r.y0, from: r.x0, to: r.x1 }, { at: r.y1, from: r.x0, to: r.x1 });
  }
}

function nearest(edges: number[], targets: { at: number }[], threshold: number): { delta: number; at: number } | null {
  let best: { delta: number; at: number } | null = null;
  for (const e of edges) {
    for (const t of targets) {
      const d = t.at - e;
      if (Math.abs(d) <= threshold && (!best || Math.abs(d) < Math.abs(best.delta))) best = { delta: d, at: t.at };
    }
  }
  return best;
}

export function snapToStep(value: number, step: number): number {
  return Math.round(value / step) * step;
}

/**
 * Snap a move of the box `box` by (dx, dy). Each axis is snapped on its own: an edge (either side
 * or the centre) that comes within `threshold` of a target sticks to it; otherwise the box's
 * near corner lands on the grid step.
 */
export function snapMove(box: Footprint, dx: number, dy: number, targets: SnapTargets, opts: SnapOptions): { dx: number; dy: number; guides: SnapGuide[] } {
  if (!opts.enabled) return { dx: Math.round(dx), dy: Math.round(dy), guides: [] };
  const guides: SnapGuide[] = [];
  const nx = box.x + dx;
  const ny = box.y + dy;
  const sx = nearest([nx, nx + box.length], targets.xs, opts.threshold);
  const sy = nearest([ny, ny + box.width], targets.ys, opts.threshold);
  let outDx: number, outDy: number;
  if (sx) {
    outDx = dx + sx.delta;
  } else {
    outDx = snapToStep(nx, opts.step) - box.x;
  }
  if (sy) {
    outDy = dy + sy.delta;
  } else {
    outDy = snapToStep(ny, opts.step) - box.y;
  }
  outDx = Math.round(outDx);
  outDy = Math.round(outDy);
  const fx = box.x + outDx, fy = box.y + outDy;
  if (sx) guides.push({ axis: 'x', at: sx.at, ...span(targets.xs, sx.at, fy, fy + box.width) });
  if (sy) guides.push({ axis: 'y', at: sy.at, ...span(targets.ys, sy.at, fx, fx + box.length) });
  return { dx: outDx, dy: outDy, guides };
}

function span(targets: { at: number; from: number; to: number }[], at: number, a: number, b: number) {
  let from = a, to = b;
  for (const t of targets) if (t.at === at) { from = Math.min(from, t.from); to = Math.max(to, t.to); }
  return { from, to };
}

export type HandleId = 'n' | 's' | 'e' | 'w' | 'ne' | 'nw' | 'se' | 'sw';
export const HANDLES: HandleId[] = ['nw', 'n', 'ne', 'e', 'se', 's', 'sw', 'w'];
/** The smallest module side a resize may leave (mm). */
export const MIN_SIDE = 20;

/**
 * Resize `rect` by dragging handle `handle` by (dx, dy) in plan. 'n' is the top of the screen
 * (y = 0, the left wall), 'w' is the left of the screen (x = 0, the cab end). The moving edges
 * snap like a move; the opposite edges stay put; no side shrinks below MIN_SIDE.
 */
export function snapResize(rect: Footprint, handle: HandleId, dx: number, dy: number, targets: SnapTargets, opts: SnapOptions): { rect: Footprint; guides: SnapGuide[] } {
  let x0 = rect.x, x1 = rect.x + rect.length, y0 = rect.y, y1 = rect.y + rect.width;
  const guides: SnapGuide[] = [];
  const moveX = handle.includes('w') ? 'x0' : handle.includes('e') ? 'x1' : null;
  const moveY = handle.includes('n') ? 'y0' : handle.includes('s') ? 'y1' : null;
  if (moveX) {
    const raw = (moveX === 'x0' ? x0 : x1) + dx;
    const v = snapEdge(raw, targets.xs, opts);
    if (moveX === 'x0') x0 = Math.min(v.value, x1 - MIN_SIDE); else x1 = Math.max(v.value, x0 + MIN_SIDE);
    if (v.snapped) guides.push({ axis: 'x', at: v.value, ...span(targets.xs, v.value, y0, y1) });
  }
  if (moveY) {
    const raw = (moveY === 'y0' ? y0 : y1) + dy;
    const v = snapEdge(raw, targets.ys, opts);
    if (moveY === 'y0') y0 = Math.min(v.value, y1 - MIN_SIDE); else y1 = Math.max(v.value, y0 + MIN_SIDE);
    if (v.snapped) guides.push({ axis: 'y', at: v.value, ...span(targets.ys, v.value, x0, x1) });
  }
  x0 = Math.round(x0); x1 = Math.round(x1); y0 = Math.round(y0); y1 = Math.round(y1);
  return { rect: { x: x0, y: y0, length: x1 - x0, width: y1 - y0 }, guides };
}

function snapEdge(raw: number, targets: { at: number }[], opts: SnapOptions): { value: number; snapped: boolean } {
  if (!opts.enabled) return { value: Math.round(raw), snapped: false };
  const hit = nearest([raw], targets, opts.threshold);
  if (hit) return { value: hit.at, snapped: true };
  return { value: snapToStep(raw, opts.step), snapped: false };
}

// ---- openings -----------------------------------------------------------------------------------

/** A module edge this close to a wall's inner face (mm) is a target for that wall's openings (common practice, no source). */
export const WALL_TARGET_REACH = 300;

/**
 * Targets along one wall, in the wall's own coordinate (from its start: the front end of a side
 * wall, the left end of the rear wall): the wall's two ends, the door edges on it, and the edges
 * of modules standing within `WALL_TARGET_REACH` of it in the arrangement on show.
 */
export function wallTargets(doc: LayoutDoc, arrangement: Arrangement, wall: 'left' | 'right' | 'rear'): number[] {
  const { length, width } = doc.bay;
  const lined = linedInterior(doc);
  const end = wall === 'rear' ? width : length;
  const at = new Set<number>([0, end]);
  for (const d of doc.bay.doors) if (d.wall === wall) { at.add(d.offset); at.add(d.offset + d.width); }
  for (const m of doc.modules) {
    if (!inArrangement(m, arrangement)) continue;
    const r = footprintRect(m);
    const near = wall === 'left' ? r.y0 - lined.y0 : wall === 'right' ? lined.y1 - r.y1 : lined.x1 - r.x1;
    if (near > WALL_TARGET_REACH) continue;
    if (wall === 'rear') { at.add(r.y0); at.add(r.y1); } else { at.add(r.x0); at.add(r.x1); }
  }
  return [...at].sort((a, b) => a - b);
}

/**
 * Snap a span along a wall (`start`..`start + size`, wall coordinates) moved by `delta`: either end
 * within `threshold` of a target sticks to it, else the start lands on the step; the result is held
 * in `min`..`max` (the wall's or the door's ends). `snapped` is the target stuck to, if any.
 */
export function snapAlong(start: number, size: number, delta: number, targets: number[], opts: SnapOptions, min: number, max: number): { start: number; snapped: number | null } {
  const raw = start + delta;
  let next: number;
  let snapped: number | null = null;
  if (!opts.enabled) next = Math.round(raw);
  else {
    const hit = nearest(size > 0 ? [raw, raw + size] : [raw], targets.map((t) => ({ at: t })), opts.threshold);
    if (hit) {
      next = Math.round(raw + hit.delta);
      snapped = hit.at;
    } else next = snapToStep(raw, opts.step);
  }
  const held = Math.max(min, Math.min(max, next));
  if (held !== next) snapped = held === min ? min : max + size;
  return { start: held, snapped };
}
