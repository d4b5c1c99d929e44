/**
 * Axis-aligned rectangles and intervals on plain numbers: the vocabulary every other geometry
 * module speaks. A `Rect` is a closed box from its min corner (x0, y0) to its max corner (x1, y1);
 * "overlap" always means overlap with positive area, "touch" means sharing only an edge or corner.
 *
 * Must never import anything of ours (lib/layout, lib/checks, UI): plain numbers in, plain numbers out.
 */

export interface Rect {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** A rectangle from a min corner and its extents (the layout document's x, y, length, width). */
export function rectFromExtent(x: number, y: number, length: number, width: number): Rect {
  return { x0: x, y0: y, x1: x + length, y1: y + width };
}

export function rectArea(r: Rect): number {
  return Math.max(0, r.x1 - r.x0) * Math.max(0, r.y1 - r.y0);
}

/** Length of the overlap of two closed intervals; 0 when they only touch or are apart. */
export function intervalOverlap(a0: number, a1: number, b0: number, b1: number): number {
  return Math.max(0, Math.min(a1, b1) - Math.max(a0, b0));
}

/** Gap between two intervals along their axis; 0 when they touch or overlap. */
export function intervalGap(a0: number, a1: number, b0: number, b1: number): number {
  return Math.max(0, Math.max(a0, b0) - Math.min(a1, b1));
}

/** The common part of two rectangles, or null when they share no positive area. */
export function rectIntersection(a: Rect, b: Rect): Rect | null {
  const x0 = Math.max(a.x0, b.x0);
  const y0 = Math.max(a.y0, b.y0);
  const x1 = Math.min(a.x1, b.x1);
  const y1 = Math.min(a.y1, b.y1);
  return x1 > x0 && y1 > y0 ? { x0, y0, x1, y1 } : null;
}

export function overlapArea(a: Rect, b: Rect): number {
  return intervalOverlap(a.x0, a.x1, b.x0, b.x1) * intervalOverlap(a.y0, a.y1, b.y0, b.y1);
}

/** True when the two rectangles share a positive area (touching edges do not count). */
export function rectsOverlap(a: Rect, b: Rect): boolean {
  return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
}

/** Euclidean distance between two rectangles: 0 when they touch or overlap. */
export function rectGap(a: Rect, b: Rect): number {
  return Math.hypot(intervalGap(a.x0, a.x1, b.x0, b.x1), intervalGap(a.y0, a.y1, b.y0, b.y1));
}

/** Euclidean distance from a point to a rectangle: 0 inside or on its edge. */
export function pointRectDistance(px: number, py: number, r: Rect): number {
  const dx = Math.max(r.x0 - px, 0, px - r.x1);
  const dy = Math.max(r.y0 - py, 0, py - r.y1);
  return Math.hypot(dx, dy);
}

/** True when `inner` lies inside `outer` (edges may coincide). */
export function rectContains(outer: Rect, inner: Rect): boolean {
  return inner.x0 >= outer.x0 && inner.y0 >= outer.y0 && inner.x1 <= outer.x1 && inner.y1 <= outer.y1;
}

/** The smallest rectangle holding all the given ones; null for none. */
export function boundingRect(rects: readonly Rect[]): Rect | null {
  if (rects.length === 0) return null;
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  for (const r of rects) {
    if (r.x0 < x0) x0 = r.x0;
    if (r.y0 < y0) y0 = r.y0;
    if (r.x1 > x1) x1 = r.x1;
    if (r.y1 > y1) y1 = r.y1;
  }
  return { x0, y0, x1, y1 };
}

/** A rectangle grown by `d` on every side (shrunk when d is negative; never inverted). */
export function expandRect(r: Rect, d: number): Rect {
  const x0 = r.x0 - d, x1 = r.x1 + d, y0 = r.y0 - d, y1 = r.y1 + d;
  return { x0: Math.min(x0, (x0 + x1) / 2), x1: Math.max(x1, (x0 + x1) / 2), y0: Math.min(y0, (y0 + y1) / 2), y1: Math.max(y1, (y0 + y1) / 2) };
}

/** A rectangle is usable when all four numbers are finite and it is not inverted. */
export function isValidRect(r: Rect): boolean {
  return Number.isFinite(r.x0) && Number.isFinite(r.y0) && Number.isFinite(r.x1) && Number.isFinite(r.y1) && r.x1 >= r.x0 && r.y1 >= r.y0;
}
