// Largest rectangle inside a union of rectangles: hand-worked shapes, a brute-force optimum on
// small integer grids, and fast-check properties (the found rectangle lies inside the union —
// checked with polygon-clipping — and no candidate beats it).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { largestRectangle, rectArea, type Rect } from '@/lib/geometry';
import { clippingCoveredArea, rectsArb } from './arbitraries';

/** Every rectangle with sides on input edges, kept when fully covered (cell test on the edge grid). */
function bruteForce(rects: Rect[]): number {
  const xs = [...new Set(rects.flatMap((r) => [r.x0, r.x1]))].sort((a, b) => a - b);
  const ys = [...new Set(rects.flatMap((r) => [r.y0, r.y1]))].sort((a, b) => a - b);
  const covered = (cx: number, cy: number) => rects.some((r) => r.x0 <= cx && cx <= r.x1 && r.y0 <= cy && cy <= r.y1);
  let best = 0;
  for (let i = 0; i < xs.length; i++) for (let j = i + 1; j < xs.length; j++) for (let k = 0; k < ys.length; k++) for (let l = k + 1; l < ys.length; l++) {
    let ok = true;
    for (let a = i; a < j && ok; a++) for (let b = k; b < l && ok; b++) ok = covered((xs[a] + xs[a + 1]) / 2, (ys[b] + ys[b + 1]) / 2);
    if (ok) best = Math.max(best, (xs[j] - xs[i]) * (ys[l] - ys[k]));
  }
  return best;
}

describe('largestRectangle by hand', () => {
  it('returns null for nothing, the rectangle itself for one', () => {
    expect(largestRectangle([])).toBeNull();
    expect(largestRectangle([{ x0: 0, y0: 0, x1: 10, y1: 0 }])).toBeNull();
    expect(largestRectangle([{ x0: 5, y0: 6, x1: 105, y1: 56 }])).toEqual({ x0: 5, y0: 6, x1: 105, y1: 56 });
  });
  it('finds the 2000 × 1500 UK-king rectangle in the L-shaped lounge', () => {
    const pieces = [{ x0: 1100, y0: 36, x1: 3100, y1: 586 }, { x0: 1100, y0: 586, x1: 2550, y1: 1536 }, { x0: 2550, y0: 586, x1: 3100, y1: 1734 }];
    expect(largestRectangle(pieces)).toEqual({ x0: 1100, y0: 36, x1: 3100, y1: 1536 });
  });
  it('an L of two boards: the larger arm wins, not the bounding box', () => {
    // 2000 × 600 along x plus 600 × 1400 standing up at the left end: best is 2000 × 600 (1.2 m²) vs 600 × 2000 (1.2 m², tie) — long side decides, then lowest
    const r = largestRectangle([{ x0: 0, y0: 0, x1: 2000, y1: 600 }, { x0: 0, y0: 600, x1: 600, y1: 2000 }])!;
    expect(rectArea(r)).toBe(1_200_000);
  });
  it('a plus shape: the longer bar wins', () => {
    const r = largestRectangle([{ x0: 0, y0: 400, x1: 2000, y1: 800 }, { x0: 800, y0: 0, x1: 1200, y1: 1500 }]);
    expect(r).toEqual({ x0: 0, y0: 400, x1: 2000, y1: 800 });
  });
  it('bridges pieces that touch: two 1000 × 1400 boards end to end make 2000 × 1400', () => {
    expect(largestRectangle([{ x0: 0, y0: 0, x1: 1000, y1: 1400 }, { x0: 1000, y0: 0, x1: 2000, y1: 1400 }])).toEqual({ x0: 0, y0: 0, x1: 2000, y1: 1400 });
  });
  it('refuses an input too complex for its cell budget with a clear error', () => {
    const many = Array.from({ length: 60 }, (_, i) => ({ x0: i * 10, y0: i * 7, x1: i * 10 + 5, y1: i * 7 + 3 }));
    expect(() => largestRectangle(many, { maxCells: 100 })).toThrow(/cell budget/);
    expect(() => largestRectangle([{ x0: 0, y0: 0, x1: Infinity, y1: 1 }])).toThrow(/finite/);
  });
});

describe('largestRectangle properties (fast-check)', () => {
  it('the found rectangle lies inside the union (polygon-clipping) and matches the brute-force optimum', () => {
    fc.assert(fc.property(rectsArb(1, 6, 60, 40), (rects) => {
      const r = largestRectangle(rects)!;
      expect(r).not.toBeNull();
      expect(clippingCoveredArea(r, rects)).toBeCloseTo(rectArea(r), 3);
      expect(rectArea(r)).toBe(bruteForce(rects));
    }), { numRuns: 150 });
  });
  it('is at least as large as the largest input rectangle and never larger than the union', () => {
    fc.assert(fc.property(rectsArb(1, 10), (rects) => {
      const r = largestRectangle(rects)!;
      expect(rectArea(r)).toBeGreaterThanOrEqual(Math.max(...rects.map(rectArea)));
      expect(clippingCoveredArea(r, rects)).toBeCloseTo(rectArea(r), 2);
    }), { numRuns: 100 });
  });
});
