/**
 * Area of a union of axis-aligned rectangles, exactly, by a sweep along x with a coverage-counting
 * segment tree over the distinct y edges: O(n log n). Our own code because the general polygon
 * libraries (polygon-clipping, clipper-lib) build the union's outline first, which is slower and
 * rounds; the tests cross-check this against polygon-clipping on random rectangle sets.
 *
 * Must never import anything of ours: plain numbers in, plain numbers out.
 */
import type { Rect } from './rect';

export function unionArea(rects: readonly Rect[]): number {
  const boxes = rects.filter((r) => r.x1 > r.x0 && r.y1 > r.y0);
  if (boxes.length === 0) return 0;

  const ys = Array.from(new Set(boxes.flatMap((r) => [r.y0, r.y1]))).sort((a, b) => a - b);
  const yIndex = new Map(ys.map((y, i) => [y, i]));
  const segments = ys.length - 1;
  const cover = new Int32Array(4 * segments);
  const covered = new Float64Array(4 * segments);

  const update = (node: number, lo: number, hi: number, from: number, to: number, delta: number): void => {
    if (to <= lo || hi <= from) return;
    if (from <= lo && hi <= to) {
      cover[node] += delta;
    } else {
      const mid = (lo + hi) >> 1;
      update(node * 2, lo, mid, from, to, delta);
      update(node * 2 + 1, mid, hi, from, to, delta);
    }
    if (cover[node] > 0) covered[node] = ys[hi] - ys[lo];
    else if (hi - lo === 1) covered[node] = 0;
    else covered[node] = covered[node * 2] + covered[node * 2 + 1];
  };

  // Events: +1 at a rectangle's left edge, -1 at its right edge.
  const events: Array<[x: number, delta: number, from: number, to: number]> = [];
  for (const r of boxes) {
    const from = yIndex.get(r.y0)!;
    const to = yIndex.get(r.y1)!;
    events.push([r.x0, 1, from, to], [r.x1, -1, from, to]);
  }
  events.sort((a, b) => a[0] - b[0]);

  let area = 0;
  let lastX = events[0][0];
  for (const [x, delta, from, to] of events) {
    area += covered[1] * (x - lastX);
    lastX = x;
    update(1, 0, segments, from, to, delta);
  }
  return area;
}
