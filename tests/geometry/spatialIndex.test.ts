// Pairing and clustering through flatbush, checked against brute force on random sets.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { clusterByGap, overlappingPairs, rectGap, rectsOverlap } from '@/lib/geometry';
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
