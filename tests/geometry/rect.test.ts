// Rectangle and interval basics, hand-worked: overlap means positive area, touching is not overlap.
import { describe, expect, it } from 'vitest';
import { boundingRect, expandRect, intervalGap, intervalOverlap, isValidRect, overlapArea, pointRectDistance, rectArea, rectContains, rectFromExtent, rectGap, rectIntersection, rectsOverlap } from '@/lib/geometry';

const a = rectFromExtent(0, 0, 100, 50); // x 0..100, y 0..50

describe('rectangles', () => {
  it('builds from the document extents and measures area', () => {
    expect(a).toEqual({ x0: 0, y0: 0, x1: 100, y1: 50 });
    expect(rectArea(a)).toBe(5000);
  });
  it('overlap needs positive area: touching edges and corners do not overlap', () => {
    expect(rectsOverlap(a, rectFromExtent(100, 0, 10, 10))).toBe(false);
    expect(rectsOverlap(a, rectFromExtent(100, 50, 10, 10))).toBe(false);
    expect(rectsOverlap(a, rectFromExtent(99, 49, 10, 10))).toBe(true);
    expect(overlapArea(a, rectFromExtent(90, 40, 20, 20))).toBe(100);
    expect(rectIntersection(a, rectFromExtent(100, 0, 10, 10))).toBeNull();
    expect(rectIntersection(a, rectFromExtent(90, 40, 20, 20))).toEqual({ x0: 90, y0: 40, x1: 100, y1: 50 });
  });
  it('gaps are Euclidean between rectangles and zero when touching', () => {
    expect(rectGap(a, rectFromExtent(103, 54, 10, 10))).toBe(5); // 3-4-5
    expect(rectGap(a, rectFromExtent(100, 0, 10, 10))).toBe(0);
    expect(intervalGap(0, 10, 15, 20)).toBe(5);
    expect(intervalOverlap(0, 10, 5, 20)).toBe(5);
    expect(intervalOverlap(0, 10, 10, 20)).toBe(0);
  });
  it('measures a point to a rectangle', () => {
    expect(pointRectDistance(50, 25, a)).toBe(0);
    expect(pointRectDistance(103, 54, a)).toBe(5);
    expect(pointRectDistance(-7, 25, a)).toBe(7);
  });
  it('contains, bounds, expands and validates', () => {
    expect(rectContains(a, rectFromExtent(0, 0, 100, 50))).toBe(true);
    expect(rectContains(a, rectFromExtent(1, 1, 100, 10))).toBe(false);
    expect(boundingRect([a, rectFromExtent(200, -10, 5, 5)])).toEqual({ x0: 0, y0: -10, x1: 205, y1: 50 });
    expect(boundingRect([])).toBeNull();
    expect(expandRect(a, 10)).toEqual({ x0: -10, y0: -10, x1: 110, y1: 60 });
    expect(rectArea(expandRect(a, -40))).toBe(0); // shrinks to a line, never inverts
    expect(isValidRect(a)).toBe(true);
    expect(isValidRect({ x0: 5, y0: 0, x1: 4, y1: 1 })).toBe(false);
    expect(isValidRect({ x0: NaN, y0: 0, x1: 4, y1: 1 })).toBe(false);
  });
});
