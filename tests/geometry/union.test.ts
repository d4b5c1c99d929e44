// Union area: hand-worked cases, then fast-check properties cross-checked against polygon-clipping
// (a general-purpose npm geometry library) on random rectangle sets.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { overlapArea, rectArea, unionArea } from '@/lib/geometry';
import { clippingUnionArea, rectArb, rectsArb, toPolygon, multiPolygonArea } from './arbitraries';
import polygonClipping from 'polygon-clipping';

describe('unionArea by hand', () => {
  it('is 0 for nothing and the area of one rectangle', () => {
    expect(unionArea([])).toBe(0);
    expect(unionArea([{ x0: 0, y0: 0, x1: 2000, y1: 1500 }])).toBe(3_000_000);
  });
  it('counts an overlap once: two 1000 × 1000 squares sharing 500 × 1000', () => {
    expect(unionArea([{ x0: 0, y0: 0, x1: 1000, y1: 1000 }, { x0: 500, y0: 0, x1: 1500, y1: 1000 }])).toBe(1_500_000);
  });
  it('adds touching rectangles exactly and ignores empty ones', () => {
    expect(unionArea([{ x0: 0, y0: 0, x1: 10, y1: 10 }, { x0: 10, y0: 0, x1: 20, y1: 10 }, { x0: 5, y0: 5, x1: 5, y1: 50 }])).toBe(200);
  });
  it('the L-shaped lounge: side bench 2000 × 550, infill 1450 × 950, rear bench 550 × 1148', () => {
    const pieces = [{ x0: 1100, y0: 36, x1: 3100, y1: 586 }, { x0: 1100, y0: 586, x1: 2550, y1: 1536 }, { x0: 2550, y0: 586, x1: 3100, y1: 1734 }];
    expect(unionArea(pieces)).toBe(2000 * 550 + 1450 * 950 + 550 * 1148);
  });
});

describe('unionArea against polygon-clipping (fast-check)', () => {
  it('equals the polygon-clipping union area', () => {
    fc.assert(fc.property(rectsArb(1, 10), (rects) => {
      expect(unionArea(rects)).toBeCloseTo(clippingUnionArea(rects), 3);
    }), { numRuns: 150 });
  });
  it('is at most the sum of the areas and at least the largest one', () => {
    fc.assert(fc.property(rectsArb(1, 12), (rects) => {
      const u = unionArea(rects);
      expect(u).toBeLessThanOrEqual(rects.reduce((s, r) => s + rectArea(r), 0));
      expect(u).toBeGreaterThanOrEqual(Math.max(...rects.map(rectArea)));
    }), { numRuns: 200 });
  });
  it('never shrinks when a rectangle is added', () => {
    fc.assert(fc.property(rectsArb(0, 10), rectArb(), (rects, extra) => {
      expect(unionArea([...rects, extra])).toBeGreaterThanOrEqual(unionArea(rects));
    }), { numRuns: 200 });
  });
  it('pairwise: union of two = sum − overlap, and the overlap matches polygon-clipping', () => {
    fc.assert(fc.property(rectArb(), rectArb(), (a, b) => {
      expect(unionArea([a, b])).toBe(rectArea(a) + rectArea(b) - overlapArea(a, b));
      const inter = polygonClipping.intersection(toPolygon(a), toPolygon(b));
      expect(overlapArea(a, b)).toBeCloseTo(multiPolygonArea(inter), 3);
    }), { numRuns: 200 });
  });
});
