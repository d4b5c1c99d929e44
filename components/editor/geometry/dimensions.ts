/**
 * Dimension strings for the plan: the overall bay, the selected module's own size, and its clear
 * gaps to the lining and to the nearest neighbour on each side (in the same arrangement). Each
 * string is a segment in mm with the value it reads. Pure math; never formats units or draws.
 */
import type { Arrangement, LayoutDoc, Module } from '@/lib/layout';
import { inArrangement, linedInterior, type Footprint } from '@/lib/layout/bay';

export type DimensionRole = 'overall' | 'size' | 'gap-lining' | 'gap-module';

export interface DimensionString {
  role: DimensionRole;
  /** Direction the string measures along. */
  axis: 'x' | 'y';
  /** Start and end along `axis`, and the position of the string on the other axis. */
  from: number;
  to: number;
  at: number;
  value: number;
  /** For gaps to a module: which one. */
  neighbourId?: string;
}

export function overallDimensions(doc: { bay: Pick<LayoutDoc['bay'], 'length' | 'width'> }, offset: number): DimensionString[] {
  const { length, width } = doc.bay;
  return [
    { role: 'overall', axis: 'x', from: 0, to: length, at: -offset, value: length },
    { role: 'overall', axis: 'y', from: 0, to: width, at: length + offset, value: width },
  ];
}

function overlapsAcross(a: Footprint, b: Footprint, axis: 'x' | 'y'): boolean {
  // Gaps along x only make sense between rects that share some y range, and vice versa.
  return axis === 'x' ? a.y < b.y + b.width && b.y < a.y + a.width : a.x < b.x + b.length && b.x < a.x + a.length;
}

/**
 * Gaps around module `m`: along y to the left and right lining (or the nearest module in
 * between), along x to the bulkhead and rear (or the nearest module). Overlapping neighbours give
 * no gap string (the overlap check reports them).
 */
export function moduleDimensions(doc: LayoutDoc, m: Module, arrangement: Arrangement): DimensionString[] {
  const lined = linedInterior(doc);
  const others = doc.modules.filter((o) => o.id !== m.id && inArrangement(o, arrangement) && overlapsElevation(o, m));
  const out: DimensionString[] = [
    { role: 'size', axis: 'x', from: m.x, to: m.x + m.length, at: m.y - 1, value: m.length },
    { role: 'size', axis: 'y', from: m.y, to: m.y + m.width, at: m.x - 1, value: m.width },
  ];
  // Gap strings run off-centre so they do not cross the module's own size strings.
  const midX = m.x + m.length * 0.72;
  const midY = m.y + m.width * 0.72;

  // Towards the left wall (smaller y)
  const up = nearestBefore(others, m, 'y');
  const upEdge = up ? up.y + up.width : lined.y0;
  if (upEdge <= m.y) out.push({ role: up ? 'gap-module' : 'gap-lining', axis: 'y', from: upEdge, to: m.y, at: midX, value: m.y - upEdge, neighbourId: up?.id });
  // Towards the right wall
  const down = nearestAfter(others, m, 'y');
  const downEdge = down ? down.y : lined.y1;
  if (downEdge >= m.y + m.width) out.push({ role: down ? 'gap-module' : 'gap-lining', axis: 'y', from: m.y + m.width, to: downEdge, at: midX, value: downEdge - (m.y + m.width), neighbourId: down?.id });
  // Towards the cab
  const front = nearestBefore(others, m, 'x');
  const frontEdge = front ? front.x + front.length : lined.x0;
  if (frontEdge <= m.x) out.push({ role: front ? 'gap-module' : 'gap-lining', axis: 'x', from: frontEdge, to: m.x, at: midY, value: m.x - frontEdge, neighbourId: front?.id });
  // Towards the rear
  const rear = nearestAfter(others, m, 'x');
  const rearEdge = rear ? rear.x : lined.x1;
  if (rearEdge >= m.x + m.length) out.push({ role: rear ? 'gap-module' : 'gap-lining', axis: 'x', from: m.x + m.length, to: rearEdge, at: midY, value: rearEdge - (m.x + m.length), neighbourId: rear?.id });
  return out;
}

/** Modules stacked above each other (a hob on a counter, a locker over a bed) are not neighbours in plan. */
function overlapsElevation(a: Module, b: Module): boolean {
  return a.elevation < b.elevation + b.height && b.elevation < a.elevation + a.height;
}

function nearestBefore(others: Module[], m: Module, axis: 'x' | 'y'): Module | undefined {
  let best: Module | undefined;
  for (const o of others) {
    if (!overlapsAcross(o, m, axis)) continue;
    const end = axis === 'x' ? o.x + o.length : o.y + o.width;
    const start = axis === 'x' ? m.x : m.y;
    if (end > start) continue;
    if (!best || end > (axis === 'x' ? best.x + best.length : best.y + best.width)) best = o;
  }
  return best;
}

function nearestAfter(others: Module[], m: Module, axis: 'x' | 'y'): Module | undefined {
  let best: Module | undefined;
  for (const o of others) {
    if (!overlapsAcross(o, m, axis)) continue;
    const start = axis === 'x' ? o.x : o.y;
    const end = axis === 'x' ? m.x + m.length : m.y + m.width;
    if (start < end) continue;
    if (!best || start < (axis === 'x' ? best.x : best.y)) best = o;
  }
  return best;
}
