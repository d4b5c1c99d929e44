/**
 * The largest axis-aligned rectangle (by area) that fits inside a union of axis-aligned
 * rectangles: how big a mattress a bed made of several boards and cushions really takes.
 *
 * Method (exact): an optimal rectangle can always be pushed out until each side meets an edge of
 * some input rectangle, so only the distinct x and y edges matter. They cut the plane into a
 * compressed grid of cells, each wholly covered or wholly uncovered (found with a 2D difference
 * array); the classic largest-rectangle-in-a-histogram stack then runs row by row with cell
 * widths and heights as weights. O(n + X·Y) for X, Y distinct edges. No npm library does this
 * (geometry packages offer unions and clipping, not inscribed rectangles), hence our own.
 *
 * Must never import anything of ours: plain numbers in, plain numbers out.
 */
import type { Rect } from './rect';
import type { WorkBudget } from './workBudget';

export interface LargestRectangleOptions {
  /** Refuse inputs whose compressed grid would exceed this many cells (default 4 million). */
  maxCells?: number;
  /** Charged with the grid's cell count before any work is done. */
  budget?: WorkBudget;
}

/**
 * Returns the largest rectangle inside the union of `rects`, or null when the union has no area.
 * Among equal areas the one with the longer long side wins, then the lowest, leftmost.
 * Throws a RangeError (never hangs) when the input is too complex for the cell budget.
 */
export function largestRectangle(rects: readonly Rect[], options: LargestRectangleOptions = {}): Rect | null {
  const boxes = rects.filter((r) => r.x1 > r.x0 && r.y1 > r.y0);
  if (boxes.length === 0) return null;
  for (const r of boxes) {
    if (![r.x0, r.x1, r.y0, r.y1].every(Number.isFinite)) throw new RangeError('largestRectangle: rectangle corners must be finite numbers');
  }

  const xs = Array.from(new Set(boxes.flatMap((r) => [r.x0, r.x1]))).sort((a, b) => a - b);
  const ys = Array.from(new Set(boxes.flatMap((r) => [r.y0, r.y1]))).sort((a, b) => a - b);
  const cols = xs.length - 1;
  const rows = ys.length - 1;
  const maxCells = options.maxCells ?? 4_000_000;
  if (cols * rows > maxCells) {
    throw new RangeError(`largestRectangle: ${boxes.length} rectangles make a ${cols} × ${rows} grid, more than the ${maxCells}-cell budget`);
  }
  options.budget?.spend(cols * rows + boxes.length);
  const xIndex = new Map(xs.map((x, i) => [x, i]));
  const yIndex = new Map(ys.map((y, i) => [y, i]));

  // 2D difference array over cells (col, row), then prefix sums: cell covered when count > 0.
  const stride = cols + 1;
  const diff = new Int32Array((cols + 1) * (rows + 1));
  for (const r of boxes) {
    const c0 = xIndex.get(r.x0)!, c1 = xIndex.get(r.x1)!;
    const r0 = yIndex.get(r.y0)!, r1 = yIndex.get(r.y1)!;
    diff[r0 * stride + c0] += 1;
    diff[r0 * stride + c1] -= 1;
    diff[r1 * stride + c0] -= 1;
    diff[r1 * stride + c1] += 1;
  }
  for (let row = 0; row <= rows; row++) {
    for (let col = 1; col <= cols; col++) diff[row * stride + col] += diff[row * stride + col - 1];
  }
  for (let row = 1; row <= rows; row++) {
    for (let col = 0; col <= cols; col++) diff[row * stride + col] += diff[(row - 1) * stride + col];
  }

  const heights = new Float64Array(cols);
  const stack = new Int32Array(cols + 1);
  let best: Rect | null = null;
  let bestArea = 0;
  let bestLong = 0;

  const consider = (x0: number, x1: number, y0: number, y1: number): void => {
    const w = x1 - x0, h = y1 - y0;
    const area = w * h;
    const long = Math.max(w, h);
    if (area > bestArea || (area === bestArea && long > bestLong)) {
      best = { x0, y0, x1, y1 };
      bestArea = area;
      bestLong = long;
    }
  };

  for (let row = 0; row < rows; row++) {
    const rowHeight = ys[row + 1] - ys[row];
    for (let col = 0; col < cols; col++) {
      heights[col] = diff[row * stride + col] > 0 ? heights[col] + rowHeight : 0;
    }
    // Largest rectangle in the weighted histogram `heights` (bar widths xs[i+1] - xs[i]).
    let top = 0;
    for (let col = 0; col <= cols; col++) {
      const h = col < cols ? heights[col] : 0;
      while (top > 0 && heights[stack[top - 1]] >= h) {
        const barH = heights[stack[--top]];
        if (barH > 0) {
          const left = top > 0 ? stack[top - 1] + 1 : 0;
          consider(xs[left], xs[col], ys[row + 1] - barH, ys[row + 1]);
        }
      }
      stack[top++] = col;
    }
  }
  return best;
}
