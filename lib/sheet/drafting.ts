/**
 * Drafting marks shared by the sheet's figures: dimension strings with architectural ticks
 * (45° slashes, not arrowheads), hatching clipped to a rectangle, a scale bar. Output is plain
 * sheet items in paper mm. Pure; must never render.
 */
import type { Ink, LineItem, SheetItem, TextItem } from './primitives';

export const LINE = { heavy: 0.5, medium: 0.3, thin: 0.18, hair: 0.1 } as const;
export const TYPE = { dimension: 6.5, label: 6.5, small: 5.5, caption: 8, heading: 10 } as const;

export interface DimensionSpec {
  /** Start and end of the measured span on paper (mm). */
  from: [number, number];
  to: [number, number];
  /** Perpendicular offset of the dimension line from the measured span (mm, + = up/left of travel). */
  offset: number;
  text: string;
  tag?: string;
}

/**
 * A dimension string: two extension lines, the dimension line exactly as long as the span, a
 * 45° tick at each end, and the value centred above it (rotated for vertical spans).
 */
export function dimension(spec: DimensionSpec): SheetItem[] {
  const [x1, y1] = spec.from;
  const [x2, y2] = spec.to;
  const horizontal = Math.abs(y2 - y1) < 1e-9;
  const items: SheetItem[] = [];
  const tick = 1.2;
  if (horizontal) {
    const y = y1 - spec.offset;
    const dir = Math.sign(spec.offset) || 1;
    items.push(ext(x1, y1 - dir * 0.8, x1, y - dir * 1.2), ext(x2, y2 - dir * 0.8, x2, y - dir * 1.2));
    items.push({ type: 'line', x1, y1: y, x2, y2: y, width: LINE.thin, ink: 'ink', tag: spec.tag });
    for (const x of [x1, x2]) items.push({ type: 'line', x1: x - tick, y1: y + tick, x2: x + tick, y2: y - tick, width: LINE.medium, ink: 'ink' });
    items.push({ type: 'text', x: (x1 + x2) / 2, y: y - 0.9, text: spec.text, size: TYPE.dimension, font: 'mono', align: 'center' });
  } else {
    const x = x1 - spec.offset;
    const dir = Math.sign(spec.offset) || 1;
    items.push(ext(x1 - dir * 0.8, y1, x - dir * 1.2, y1), ext(x2 - dir * 0.8, y2, x - dir * 1.2, y2));
    items.push({ type: 'line', x1: x, y1, x2: x, y2, width: LINE.thin, ink: 'ink', tag: spec.tag });
    for (const y of [y1, y2]) items.push({ type: 'line', x1: x - tick, y1: y + tick, x2: x + tick, y2: y - tick, width: LINE.medium, ink: 'ink' });
    items.push({ type: 'text', x: x - 0.9, y: (y1 + y2) / 2, text: spec.text, size: TYPE.dimension, font: 'mono', align: 'center', rotate: 90 });
  }
  return items;
}

function ext(x1: number, y1: number, x2: number, y2: number): LineItem {
  return { type: 'line', x1, y1, x2, y2, width: LINE.hair, ink: 'soft' };
}

/**
 * Parallel hatch lines at `angle` degrees (0 = horizontal, 45 = rising to the right on paper)
 * every `spacing` mm, clipped to the rectangle.
 */
export function hatch(x: number, y: number, w: number, h: number, spacing: number, angle: number, ink: Ink = 'faint', width: number = LINE.hair): LineItem[] {
  if (w <= 0 || h <= 0 || spacing <= 0) return [];
  const out: LineItem[] = [];
  const t = (angle * Math.PI) / 180;
  // Direction of the lines (paper y points down, so "rising" means negative dy).
  const dx = Math.cos(t);
  const dy = -Math.sin(t);
  // Normal to the lines; sweep offsets along it across the rectangle's corners.
  const nx = -dy;
  const ny = dx;
  const corners = [[x, y], [x + w, y], [x, y + h], [x + w, y + h]];
  const proj = corners.map(([cx, cy]) => cx * nx + cy * ny);
  const lo = Math.min(...proj);
  const hi = Math.max(...proj);
  for (let d = Math.ceil(lo / spacing) * spacing; d <= hi; d += spacing) {
    const seg = clipLine(d, nx, ny, dx, dy, x, y, w, h);
    if (seg) out.push({ type: 'line', x1: seg[0], y1: seg[1], x2: seg[2], y2: seg[3], width, ink });
    if (out.length > 4000) break; // a runaway spacing must not flood the page
  }
  return out;
}

/** The part of the line {p : p·n = d} inside the rectangle, or null. */
function clipLine(d: number, nx: number, ny: number, dx: number, dy: number, x: number, y: number, w: number, h: number): [number, number, number, number] | null {
  // A point on the line, then Liang–Barsky clipping of a long segment along the direction.
  const px = nx * d;
  const py = ny * d;
  const big = 1e5;
  let t0 = -big;
  let t1 = big;
  const edges: [number, number][] = [[-dx, px - x], [dx, x + w - px], [-dy, py - y], [dy, y + h - py]];
  for (const [p, q] of edges) {
    if (Math.abs(p) < 1e-12) {
      if (q < 0) return null;
      continue;
    }
    const r = q / p;
    if (p < 0) t0 = Math.max(t0, r);
    else t1 = Math.min(t1, r);
    if (t0 > t1) return null;
  }
  if (t1 - t0 < 1e-6) return null;
  return [px + dx * t0, py + dy * t0, px + dx * t1, py + dy * t1];
}

/** A stipple of short marks on a staggered grid (upholstery), clipped inside the rectangle. */
export function stipple(x: number, y: number, w: number, h: number, spacing: number): LineItem[] {
  const out: LineItem[] = [];
  let row = 0;
  for (let yy = y + spacing / 2; yy < y + h; yy += spacing, row++) {
    for (let xx = x + (row % 2 ? spacing : spacing / 2); xx < x + w; xx += spacing) {
      out.push({ type: 'line', x1: xx - 0.15, y1: yy, x2: xx + 0.15, y2: yy, width: LINE.thin, ink: 'faint' });
      if (out.length > 2000) return out;
    }
  }
  return out;
}

/**
 * A scale bar of `realMm` (e.g. 1000 mm) at 1:`scale`: alternate filled and open blocks of
 * `stepMm`, labelled at both ends and the middle.
 */
export function scaleBar(x: number, y: number, scale: number, realMm = 1000, stepMm = 100): SheetItem[] {
  const items: SheetItem[] = [];
  const length = realMm / scale;
  const step = stepMm / scale;
  const h = 1.6;
  for (let i = 0; i * step < length - 1e-9; i++) {
    items.push({ type: 'rect', x: x + i * step, y, w: step, h, stroke: 'ink', width: LINE.hair, fill: i % 2 === 0 ? 'ink' : 'white' });
  }
  const label = (at: number, text: string): TextItem => ({ type: 'text', x: x + at, y: y + h + 2.6, text, size: TYPE.small, font: 'mono', align: 'center' });
  items.push(label(0, '0'), label(length / 2, `${realMm / 2}`), label(length, `${realMm} mm`));
  return items;
}
