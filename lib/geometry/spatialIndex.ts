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
import type { WorkBudget } from './workBudget';

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
export function clusterByGap(rects: readonly Rect[], gap: number, budget?: WorkBudget): number[][] {
  if (!(gap >= 0) || !Number.isFinite(gap)) throw new RangeError(`clusterByGap: gap must be a finite number ≥ 0, got ${gap}`);
  const index = buildIndex(rects);
  if (!index) return [];
  const sets = new DisjointSet(rects.length);
  rects.forEach((r, i) => {
    let visited = 0;
    index.search(r.x0 - gap, r.y0 - gap, r.x1 + gap, r.y1 + gap, (j) => {
      visited++;
      if (j > i && !sets.same(i, j)) {
        const d = rectGap(r, rects[j]);
        if (d === 0 || d < gap) sets.union(i, j);
      }
      return false;
    });
    // A visit costs a few steps (a distance and a union–find look-up).
    budget?.spend(1 + 4 * visited);
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

export interface OverlapGroups {
  /** Groups of two or more rectangles chained together by accepted overlaps, indices ascending, ordered by first index. */
  groups: number[][];
  /** For every rectangle, the partner of its deepest accepted overlap (−1 when none was found). */
  deepestPartner: Int32Array;
  /** False when the work budget ran out before every rectangle was compared with its neighbours. */
  complete: boolean;
  /** Candidate pairs looked at. */
  examined: number;
}

/**
 * Clusters of mutually overlapping rectangles (chained: a overlaps b, b overlaps c), filtered by
 * `accept`. Work is bounded by `maxExamined` candidate pairs (plus at most one more query's worth),
 * so a pile of thousands of rectangles on one spot — n² pairs — costs no more than the budget;
 * `complete` then says the answer may lack groups among the rectangles not yet compared.
 * `depth(i, j)` ranks overlaps for `deepestPartner` (e.g. the smaller of the two overlap extents).
 */
export function overlapGroups(
  rects: readonly Rect[],
  accept: (i: number, j: number) => boolean,
  depth: (i: number, j: number) => number,
  maxExamined: number,
): OverlapGroups {
  const n = rects.length;
  const deepestPartner = new Int32Array(n).fill(-1);
  const deepest = new Float64Array(n).fill(-Infinity);
  const index = buildIndex(rects);
  if (!index) return { groups: [], deepestPartner, complete: true, examined: 0 };
  const sets = new DisjointSet(n);
  const linked = new Uint8Array(n);
  let examined = 0;
  let complete = true;
  for (let i = 0; i < n; i++) {
    if (examined >= maxExamined) {
      complete = false;
      break;
    }
    const r = rects[i];
    index.search(r.x0, r.y0, r.x1, r.y1, (j) => {
      examined++;
      if (j > i && rectsOverlap(r, rects[j]) && accept(i, j)) {
        sets.union(i, j);
        linked[i] = linked[j] = 1;
        const d = depth(i, j);
        if (d > deepest[i]) {
          deepest[i] = d;
          deepestPartner[i] = j;
        }
        if (d > deepest[j]) {
          deepest[j] = d;
          deepestPartner[j] = i;
        }
      }
      return false;
    });
  }
  const byRoot = new Map<number, number[]>();
  for (let i = 0; i < n; i++) {
    if (!linked[i]) continue;
    const root = sets.find(i);
    const g = byRoot.get(root);
    if (g) g.push(i);
    else byRoot.set(root, [i]);
  }
  return { groups: Array.from(byRoot.values()), deepestPartner, complete, examined };
}

/**
 * A fixed set of rectangles to ask "which of these share a positive area with this one?" (or,
 * with `reach`, lie within that distance of it). Each question's visits are spent from `budget`,
 * so many questions over a hostile pile stop at the work limit instead of growing as n².
 */
export class RectIndex {
  private readonly index: Flatbush | null;

  constructor(readonly rects: readonly Rect[]) {
    this.index = buildIndex(rects);
  }

  /** Indices (ascending) of rectangles overlapping `q` in area, or within `reach` of it when reach > 0. */
  near(q: Rect, reach = 0, budget?: WorkBudget): number[] {
    if (!this.index) return [];
    const out: number[] = [];
    let visited = 0;
    this.index.search(q.x0 - reach, q.y0 - reach, q.x1 + reach, q.y1 + reach, (j) => {
      visited++;
      const r = this.rects[j];
      if (reach > 0 ? rectGap(q, r) <= reach : rectsOverlap(q, r)) out.push(j);
      return false;
    });
    budget?.spend(1 + 2 * visited);
    return out.sort((a, b) => a - b);
  }
}

/** Distance from a point to a rectangle's edge, 0 inside it. */
export function distanceToRect(x: number, y: number, r: Rect): number {
  return Math.hypot(Math.max(r.x0 - x, 0, x - r.x1), Math.max(r.y0 - y, 0, y - r.y1));
}

/**
 * Asks, point after point, which rectangle is nearest (flatbush's nearest-neighbour search), so n
 * points over m rectangles cost about (n + m) log m rather than n × m. Identical rectangles are
 * indexed once (the first of them answers), so a pile of them on one spot cannot slow a search.
 * Returns the rectangle's index and its distance, or null when none lies within `limit`.
 */
export function nearestRectFinder(rects: readonly Rect[]): (x: number, y: number, limit?: number) => { index: number; distance: number } | null {
  const firstOf = new Map<string, number>();
  const kept: number[] = [];
  rects.forEach((r, i) => {
    const key = `${r.x0},${r.y0},${r.x1},${r.y1}`;
    if (!firstOf.has(key)) {
      firstOf.set(key, i);
      kept.push(i);
    }
  });
  const index = buildIndex(kept.map((i) => rects[i]));
  return (x, y, limit = Infinity) => {
    if (!index) return null;
    const [found] = index.neighbors(x, y, 1, limit);
    if (found === undefined) return null;
    const i = kept[found];
    return { index: i, distance: distanceToRect(x, y, rects[i]) };
  };
}
