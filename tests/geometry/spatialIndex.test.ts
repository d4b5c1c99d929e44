// Pairing and clustering through flatbush, checked against brute force on random sets.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { clusterByGap, distanceToRect, nearestRectFinder, overlappingPairs, rectGap, rectsOverlap } from '@/lib/geometry';
import { rectsArb } from './arbitraries';

describe('overlappingPairs', () => {
  it('finds overlaps but not touches, by hand', () => {
    const rects = [{ x0: 0, y0: 0, x1: 10, y1: 10 }, { x0: 10, y0: 0, x1: 20, y1: 10 }, { x0: 5, y0: 5, x1: 15, y1: 15 }];
    expect(overlappingPairs(rects)).toEqual([[0, 2], [1, 2]]);
    expect(overlappingPairs(rects, (i) => i !== 0)).toEqual([[1, 2]]);
    expect(overlappingPairs([])).toEqual([]);
  });
  it('equals the brute-force list of pairs (fast-check)', () => {
    fc.assert(fc.property(rectsArb(0, 30, 2000, 600), (rects) => {
      const brute: Array<[number, number]> = [];
      for (let i = 0; i < rects.length; i++) for (let j = i + 1; j < rects.length; j++) if (rectsOverlap(rects[i], rects[j])) brute.push([i, j]);
      expect(overlappingPairs(rects)).toEqual(brute);
    }), { numRuns: 150 });
  });
});

describe('clusterByGap', () => {
  it('joins touching pieces and pieces closer than the gap, by hand', () => {
    const rects = [{ x0: 0, y0: 0, x1: 10, y1: 10 }, { x0: 10, y0: 0, x1: 20, y1: 10 }, { x0: 39, y0: 0, x1: 50, y1: 10 }, { x0: 70, y0: 0, x1: 80, y1: 10 }];
    expect(clusterByGap(rects, 20)).toEqual([[0, 1, 2], [3]]); // 19 < 20 joins, exactly 20 does not
    expect(clusterByGap(rects, 0)).toEqual([[0, 1], [2], [3]]);
    expect(() => clusterByGap(rects, -1)).toThrow(RangeError);
  });
  it('puts two rectangles in one cluster exactly when a chain of near pairs links them (fast-check)', () => {
    fc.assert(fc.property(rectsArb(1, 20, 2000, 300), fc.integer({ min: 0, max: 60 }), (rects, gap) => {
      const groups = clusterByGap(rects, gap);
      const groupOf = new Map<number, number>();
      groups.forEach((g, k) => g.forEach((i) => groupOf.set(i, k)));
      expect(groupOf.size).toBe(rects.length);
      for (let i = 0; i < rects.length; i++) for (let j = i + 1; j < rects.length; j++) {
        const d = rectGap(rects[i], rects[j]);
        if (d === 0 || d < gap) expect(groupOf.get(i)).toBe(groupOf.get(j));
      }
      // and every group is connected by such links (flood fill inside it)
      for (const g of groups) {
        const seen = new Set([g[0]]);
        const stack = [g[0]];
        while (stack.length) {
          const i = stack.pop()!;
          for (const j of g) if (!seen.has(j) && (rectGap(rects[i], rects[j]) === 0 || rectGap(rects[i], rects[j]) < gap)) { seen.add(j); stack.push(j); }
        }
        expect(seen.size).toBe(g.length);
      }
    }), { numRuns: 150 });
  });
});

describe('nearestRectFinder', () => {
  it('finds the nearest rectangle and its distance, within the limit, by hand', () => {
    const rects = [{ x0: 0, y0: 0, x1: 10, y1: 10 }, { x0: 40, y0: 0, x1: 50, y1: 10 }];
    const nearest = nearestRectFinder(rects);
    expect(nearest(5, 5)).toEqual({ index: 0, distance: 0 }); // inside
    expect(nearest(34, 5)).toEqual({ index: 1, distance: 6 }); // 40 − 34
    // Between them, above: 25 − 10 = 15 across to the first, 14 − 10 = 4 up; the second is 40 − 25 = 15 across too.
    expect(nearest(25, 14)!.distance).toBeCloseTo(Math.hypot(15, 4), 9);
    expect(nearest(34, 5, 5)).toBeNull(); // 6 mm away, 5 allowed
    expect(nearest(34, 5, 6)).toEqual({ index: 1, distance: 6 }); // the limit counts as within
    expect(nearestRectFinder([])(0, 0)).toBeNull();
  });
  it('gives the brute-force nearest distance for any set and point (fast-check)', () => {
    fc.assert(fc.property(rectsArb(1, 40, 3000, 600), fc.integer({ min: -500, max: 3500 }), fc.integer({ min: -500, max: 3500 }), (rects, x, y) => {
      const best = Math.min(...rects.map((r) => distanceToRect(x, y, r)));
      const found = nearestRectFinder(rects)(x, y)!;
      expect(found.distance).toBeCloseTo(best, 9);
      expect(distanceToRect(x, y, rects[found.index])).toBeCloseTo(best, 9);
    }), { numRuns: 200 });
  });
  it('answers a pile of 5000 identical rectangles (the worst input) by the first of them', () => {
    const pile = Array.from({ length: 5000 }, () => ({ x0: 100, y0: 100, x1: 700, y1: 500 }));
    pile.push({ x0: 900, y0: 100, x1: 1000, y1: 200 });
    const nearest = nearestRectFinder(pile);
    expect(nearest(0, 0)).toEqual({ index: 0, distance: Math.hypot(100, 100) });
    expect(nearest(1100, 150)).toEqual({ index: 5000, distance: 100 });
  });
});
