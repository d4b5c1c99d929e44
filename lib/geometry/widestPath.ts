/**
 * Upper bounds on how wide a person can be and still get somewhere, from one free-floor sweep:
 * for each free interval, the best over all routes from an opening of the narrowest span met on
 * the way (a maximin, or "widest path", by Dijkstra's method with a max-heap). An interval's span
 * (its length + 2r) bounds the diameter of any disk whose centre stands there, and an entry
 * interval is also bounded by its opening's width. The check engine uses these bounds as the first
 * guess of the exact search by repeated sweeps, which keeps that search to about two sweeps.
 * Our own code: it runs on the sweep's own interval graph.
 *
 * Must never import anything of ours: plain numbers in, plain numbers out.
 */
import type { FreeFloor } from './freeFloor';
import type { Rect } from './rect';

/** Best route bound per interval of `floor` (-Infinity where no opening leads). */
export function widestRouteBounds(floor: FreeFloor): Float64Array {
  const n = floor.lo.length;
  const span = new Float64Array(n);
  for (let i = 0; i < n; i++) span[i] = floor.hi[i] - floor.lo[i] + 2 * floor.radius;

  // Adjacency in CSR form from the edge list.
  const degree = new Int32Array(n + 1);
  for (let k = 0; k < floor.edgeA.length; k++) {
    degree[floor.edgeA[k] + 1]++;
    degree[floor.edgeB[k] + 1]++;
  }
  for (let i = 0; i < n; i++) degree[i + 1] += degree[i];
  const fillAt = degree.slice(0, n);
  const adjacent = new Int32Array(floor.edgeA.length * 2);
  for (let k = 0; k < floor.edgeA.length; k++) {
    const a = floor.edgeA[k], b = floor.edgeB[k];
    adjacent[fillAt[a]++] = b;
    adjacent[fillAt[b]++] = a;
  }

  const best = new Float64Array(n).fill(-Infinity);
  // Binary max-heap of (value, interval) with lazy deletion.
  const heapV: number[] = [];
  const heapI: number[] = [];
  const push = (v: number, i: number) => {
    let p = heapV.length;
    heapV.push(v);
    heapI.push(i);
    while (p > 0) {
      const q = (p - 1) >> 1;
      if (heapV[q] >= v) break;
      heapV[p] = heapV[q];
      heapI[p] = heapI[q];
      p = q;
    }
    heapV[p] = v;
    heapI[p] = i;
  };
  const pop = (): number => {
    const top = heapI[0];
    const lastV = heapV.pop()!;
    const lastI = heapI.pop()!;
    const size = heapV.length;
    if (size > 0) {
      let p = 0;
      for (;;) {
        let c = 2 * p + 1;
        if (c >= size) break;
        if (c + 1 < size && heapV[c + 1] > heapV[c]) c++;
        if (heapV[c] <= lastV) break;
        heapV[p] = heapV[c];
        heapI[p] = heapI[c];
        p = c;
      }
      heapV[p] = lastV;
      heapI[p] = lastI;
    }
    return top;
  };

  for (let i = 0; i < n; i++) {
    if (floor.entryWidth[i] > 0) {
      const v = Math.min(span[i], floor.entryWidth[i]);
      if (v > best[i]) {
        best[i] = v;
        push(v, i);
      }
    }
  }
  const done = new Uint8Array(n);
  while (heapV.length > 0) {
    const v = heapV[0];
    const i = pop();
    if (done[i] || v < best[i]) continue;
    done[i] = 1;
    for (let k = degree[i]; k < degree[i + 1]; k++) {
      const j = adjacent[k];
      const w = Math.min(v, span[j]);
      if (w > best[j]) {
        best[j] = w;
        push(w, j);
      }
    }
  }
  return best;
}

/** The best route bound over the intervals where a centre could stand inside `zone`. */
export function widestRouteIntoZone(floor: FreeFloor, bounds: Float64Array, zone: Rect): number {
  let out = -Infinity;
  const { columns, colStart, lo, hi } = floor;
  let c = 0;
  let b = columns.length;
  while (c < b) {
    const mid = (c + b) >> 1;
    if (columns[mid] < zone.x0) c = mid + 1;
    else b = mid;
  }
  for (; c < columns.length && columns[c] <= zone.x1; c++) {
    for (let i = colStart[c]; i < colStart[c + 1]; i++) {
      if (lo[i] <= zone.y1 && hi[i] >= zone.y0 && bounds[i] > out) out = bounds[i];
    }
  }
  return out;
}
