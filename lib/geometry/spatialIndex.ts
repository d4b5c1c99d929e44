/**
 * Finding nearby rectangles fast: pairs that overlap, and clusters of rectangles that touch or
 * lie within a gap of each other. Built on flatbush (a static packed R-tree from npm), so a
 * layout with thousands of modules never pays for all n² pairs.
 *
 * Must never import anything of ours: plain numbers in, plain numbers out.
 */
import Flatbush from 'flatbush';
import { DisjointSet } from './disjointSet';
import { rectGap, rectsOverlap, type Rect } from './rect';

function buildIndex(rects: readonly Rect[]): Flatbush | null {
  if (rects.length === 0) return null;
  const index = new Flatbush(rects.length);
  for (const r of rects) index.add(r.x0, r.y0, r.x1, r.y1);
  index.finish();
  return index;
}

/**
 * Every pair (i, j), i < j, whose rectangles share a positive area in plan, filtered by
 * `accept` (e.g. "present in a common arrangement and their height bands overlap").
 */
export function overlappingPairs(rects: readonly Rect[], accept: (i: number, j: number) => boolean = () => true): Array<[number, number]> {
  const index = buildIndex(rects);
  if (!index) return [];
  const pairs: Array<[number, number]> = [];
  rects.forEach((r, i) => {
    for (const j of index.search(r.x0, r.y0, r.x1, r.y1)) {
      if (j > i && rectsOverlap(r, rects[j]) && accept(i, j)) pairs.push([i, j]);
    }
  });
  pairs.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  return pairs;
}

/**
 * Groups of rectangles chained together by touching or by lying closer than `gap` (Euclidean, in
 * plan). `gap = 0` joins only rectangles that touch or overlap. Each group lists indices in
 * ascending order; groups are ordered by their first index.
 */
export function clusterByGap(rects: readonly Rect[], gap: number): number[][] {
  if (!(gap >= 0) || !Number.isFinite(gap)) throw new RangeError(`clusterByGap: gap must be a finite number ≥ 0, got ${gap}`);
  const index = buildIndex(rects);
  if (!index) return [];
  const sets = new DisjointSet(rects.length);
  rects.forEach((r, i) => {
    for (const j of index.search(r.x0 - gap, r.y0 - gap, r.x1 + gap, r.y1 + gap)) {
      if (j > i) {
        const d = rectGap(r, rects[j]);
        if (d === 0 || d < gap) sets.union(i, j);
      }
    }
  });
  const groups = new Map<number, number[]>();
  rects.forEach((_, i) => {
    const root = sets.find(i);
    const g = groups.get(root);
    if (g) g.push(i);
    else groups.set(root, [i]);
  });
  return Array.from(groups.values()).sort((a, b) => a[0] - b[0]);
}
