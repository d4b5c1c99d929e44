/**
 * Which module or resize handle is under the pointer, and which modules a marquee catches.
 * Hit testing in mm on the store's data, so no Konva layer needs to listen for events.
 * Pure math; never reads the DOM or the store.
 */
import type { Module } from '@/lib/layout';
import { rectsOverlap, type Rect } from '@/lib/geometry/rect';
import { footprintRect, type Footprint } from '@/lib/layout/bay';
import { HANDLES, type HandleId } from './snapping';

/** Draw order: lower modules first, so a hob on a counter is drawn (and hit) on top. */
export function drawOrder(modules: Module[]): Module[] {
  return modules
    .map((m, i) => ({ m, i }))
    .sort((a, b) => a.m.elevation - b.m.elevation || a.i - b.i)
    .map((e) => e.m);
}

/** The topmost module under (x, y), from modules already in draw order. */
export function moduleAt(ordered: Module[], x: number, y: number, slop = 0): Module | undefined {
  for (let i = ordered.length - 1; i >= 0; i--) {
    const m = ordered[i];
    if (x >= m.x - slop && x <= m.x + m.length + slop && y >= m.y - slop && y <= m.y + m.width + slop) return m;
  }
  return undefined;
}

export function handlePoint(r: Footprint, h: HandleId): { x: number; y: number } {
  const x = h.includes('w') ? r.x : h.includes('e') ? r.x + r.length : r.x + r.length / 2;
  const y = h.includes('n') ? r.y : h.includes('s') ? r.y + r.width : r.y + r.width / 2;
  return { x, y };
}

/** The resize handle within `radius` mm of (x, y), if any. */
export function handleAt(r: Footprint, x: number, y: number, radius: number): HandleId | undefined {
  let best: { h: HandleId; d: number } | undefined;
  for (const h of HANDLES) {
    const p = handlePoint(r, h);
    const d = Math.max(Math.abs(p.x - x), Math.abs(p.y - y));
    if (d <= radius && (!best || d < best.d)) best = { h, d };
  }
  return best?.h;
}

/** Modules the marquee touches; the marquee is a drag from its corner, so its extents may be negative. */
export function modulesInMarquee(modules: Module[], marquee: Footprint): string[] {
  const x1 = marquee.x + marquee.length, y1 = marquee.y + marquee.width;
  const norm: Rect = { x0: Math.min(marquee.x, x1), y0: Math.min(marquee.y, y1), x1: Math.max(marquee.x, x1), y1: Math.max(marquee.y, y1) };
  return modules.filter((m) => rectsOverlap(footprintRect(m), norm)).map((m) => m.id);
}

export function cursorForHandle(h: HandleId): string {
  if (h === 'n' || h === 's') return 'ns-resize';
  if (h === 'e' || h === 'w') return 'ew-resize';
  return h === 'ne' || h === 'sw' ? 'nesw-resize' : 'nwse-resize';
}
