// Shared fast-check generators for rectangle sets on a millimetre grid, and the polygon-clipping
// cross-check (a general-purpose geometry library from npm) for areas.
import fc from 'fast-check';
import polygonClipping, { type MultiPolygon, type Polygon } from 'polygon-clipping';
import type { Rect } from '@/lib/geometry';

export const rectArb = (max = 3000, maxSide = 1500): fc.Arbitrary<Rect> =>
  fc
    .record({ x: fc.integer({ min: 0, max }), y: fc.integer({ min: 0, max }), w: fc.integer({ min: 1, max: maxSide }), h: fc.integer({ min: 1, max: maxSide }) })
    .map(({ x, y, w, h }) => ({ x0: x, y0: y, x1: x + w, y1: y + h }));

export const rectsArb = (minLength = 1, maxLength = 12, max = 3000, maxSide = 1500) => fc.array(rectArb(max, maxSide), { minLength, maxLength });

export function toPolygon(r: Rect): Polygon {
  return [[[r.x0, r.y0], [r.x1, r.y0], [r.x1, r.y1], [r.x0, r.y1], [r.x0, r.y0]]];
}

function ringArea(ring: [number, number][]): number {
  let s = 0;
  for (let i = 0; i + 1 < ring.length; i++) s += ring[i][0] * ring[i + 1][1] - ring[i + 1][0] * ring[i][1];
  return Math.abs(s) / 2;
}

export function multiPolygonArea(mp: MultiPolygon): number {
  return mp.reduce((total, poly) => total + ringArea(poly[0] as [number, number][]) - poly.slice(1).reduce((h, ring) => h + ringArea(ring as [number, number][]), 0), 0);
}

/** Area of the union by polygon-clipping. */
export function clippingUnionArea(rects: Rect[]): number {
  if (rects.length === 0) return 0;
  const [first, ...rest] = rects.map(toPolygon);
  return multiPolygonArea(polygonClipping.union(first, ...rest));
}

/** Area of (r ∩ union of rects) by polygon-clipping. */
export function clippingCoveredArea(r: Rect, rects: Rect[]): number {
  if (rects.length === 0) return 0;
  const [first, ...rest] = rects.map(toPolygon);
  return multiPolygonArea(polygonClipping.intersection(toPolygon(r), polygonClipping.union(first, ...rest)));
}
