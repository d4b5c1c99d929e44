/**
 * Where a person can get to: a disk of radius r (the walkway width halved) moving over the free
 * floor of a rectangular interior with rectangular obstacles, entering through openings in the
 * interior's edges. This is the clearance field of the check engine.
 *
 * Method — an exact sweep along x, our own because no npm geometry package models a moving disk:
 * the interior is cut into columns (vertical lines) at every x where the picture can change —
 * each obstacle's edges x0, x1 and x0 − r, x1 + r, each opening's ends ± r, every measuring
 * mark the caller passes — plus a fill line every `fillStep` mm. On each column the places where
 * the disk centre may stand form closed intervals of y, computed exactly: an obstacle at
 * horizontal distance dx < r forbids the open interval (y0 − h, y1 + h) with h = √(r² − dx²).
 * Intervals on neighbouring columns that overlap in y are joined (union–find).
 *
 * Why that is sound: between two neighbouring columns no obstacle edge is crossed, so along a
 * horizontal segment the distance to each obstacle is monotone — if both ends are free the whole
 * segment is. Touching is allowed (a disk exactly as wide as a gap passes), and because the
 * critical lines are columns, an axis-aligned gap exactly 2r wide is found as a one-point
 * interval, so "exactly at the limit passes" holds. Where a passage runs diagonally between two
 * corners offset in both directions, a free channel narrower than the fill step in y can be
 * missed: the result then errs on the safe side (reported as blocked), by at most the fill step.
 *
 * Must never import anything of ours: plain numbers in, plain numbers out.
 */
import { DisjointSet } from './disjointSet';
import type { Rect } from './rect';
import type { WorkBudget } from './workBudget';

/** A gap in one edge of the interior through which the disk enters. `from`/`to` run along that edge. */
export interface Opening {
  edge: 'minX' | 'maxX' | 'minY' | 'maxY';
  from: number;
  to: number;
}

export interface FreeFloorInput {
  /** The walls: the disk stays wholly inside this rectangle. */
  interior: Rect;
  /** Footprints the disk may not overlap (it may touch them). */
  obstacles: readonly Rect[];
  /** Where the disk comes in; its centre starts on the edge line moved inwards by r, wholly inside the opening. */
  openings: readonly Opening[];
  /** x positions to cut columns at, so measurements there are exact (edges of zones and rects you will ask about). */
  marks?: readonly number[];
  /** Largest spacing between columns, mm (default 20). */
  fillStep?: number;
  /** Charged for every obstacle and interval a sweep or query visits; it throws when spent. */
  budget?: WorkBudget;
}

/** Obstacles sorted once so sweeps at many radii reuse the work. */
export class FreeFloorModel {
  readonly interior: Rect;
  readonly openings: readonly Opening[];
  readonly fillStep: number;
  readonly marks: Float64Array;
  readonly budget?: WorkBudget;
  /** Obstacles in order of x0, as columns of numbers. */
  readonly ox0: Float64Array;
  readonly ox1: Float64Array;
  readonly oy0: Float64Array;
  readonly oy1: Float64Array;

  constructor(input: FreeFloorInput) {
    const { interior } = input;
    if (![interior.x0, interior.x1, interior.y0, interior.y1].every(Number.isFinite)) throw new RangeError('free floor: the interior must have finite corners');
    const fill = input.fillStep ?? 20;
    if (!(fill > 0) || !Number.isFinite(fill)) throw new RangeError(`free floor: fillStep must be a positive number, got ${fill}`);
    this.interior = interior;
    this.openings = input.openings.filter((o) => Number.isFinite(o.from) && Number.isFinite(o.to) && o.to >= o.from);
    this.fillStep = fill;
    this.budget = input.budget;
    this.marks = Float64Array.from((input.marks ?? []).filter(Number.isFinite));
    const obstacles = input.obstacles.filter((o) => [o.x0, o.x1, o.y0, o.y1].every(Number.isFinite) && o.x1 >= o.x0 && o.y1 >= o.y0);
    obstacles.sort((a, b) => a.x0 - b.x0);
    const n = obstacles.length;
    this.ox0 = new Float64Array(n);
    this.ox1 = new Float64Array(n);
    this.oy0 = new Float64Array(n);
    this.oy1 = new Float64Array(n);
    obstacles.forEach((o, i) => {
      this.ox0[i] = o.x0;
      this.ox1[i] = o.x1;
      this.oy0[i] = o.y0;
      this.oy1[i] = o.y1;
    });
    this.sortedX1 = Float64Array.from(this.ox1).sort();
    const base = new Float64Array(2 * n + this.marks.length);
    base.set(this.ox0, 0);
    base.set(this.ox1, n);
    base.set(this.marks, 2 * n);
    this.baseCuts = base.sort();
  }

  /** Obstacle right edges, ascending. */
  readonly sortedX1: Float64Array;
  /** Radius-independent column positions (obstacle edges and marks), ascending. */
  readonly baseCuts: Float64Array;

  /** Sweeps the floor for a disk of the given radius. */
  sweep(radius: number): FreeFloor {
    if (!(radius >= 0) || !Number.isFinite(radius)) throw new RangeError(`free floor: radius must be a finite number ≥ 0, got ${radius}`);
    return new FreeFloor(this, radius);
  }
}

/** Grows a Float64Array by doubling. */
class NumberList {
  data: Float64Array;
  length = 0;
  constructor(capacity: number) {
    this.data = new Float64Array(Math.max(16, capacity));
  }
  push(v: number): void {
    if (this.length === this.data.length) {
      const next = new Float64Array(this.data.length * 2);
      next.set(this.data);
      this.data = next;
    }
    this.data[this.length++] = v;
  }
}

/** The free floor for one disk radius: columns, their free intervals, and which connect to an opening. */
export class FreeFloor {
  readonly radius: number;
  /** Centre may stand in x ∈ [xMin, xMax], y ∈ [yMin, yMax]; empty when the interior is narrower than the disk. */
  readonly xMin: number;
  readonly xMax: number;
  readonly yMin: number;
  readonly yMax: number;
  readonly columns: Float64Array;
  /** Intervals of column c are colStart[c] .. colStart[c+1]-1, sorted by y. */
  readonly colStart: Int32Array;
  readonly lo: Float64Array;
  readonly hi: Float64Array;
  /** Component root of each interval. */
  readonly component: Int32Array;
  /** Graph edges: interval edgeA[k] overlaps interval edgeB[k] on the next column. */
  readonly edgeA: Int32Array;
  readonly edgeB: Int32Array;
  /** Per interval: the widest opening the disk can enter it by (0 when it is not an entry). */
  readonly entryWidth: Float64Array;
  /** Bit k set where the interval's component is reached from opening k (at most 32 openings). */
  readonly entered: Uint32Array;
  /** Which openings admit the disk at all (index as in the model). */
  readonly openingUsable: boolean[];
  /** The model's work budget, charged by the queries too. */
  private readonly budget?: WorkBudget;

  constructor(model: FreeFloorModel, r: number) {
    this.radius = r;
    const { interior } = model;
    this.xMin = interior.x0 + r;
    this.xMax = interior.x1 - r;
    this.yMin = interior.y0 + r;
    this.yMax = interior.y1 - r;
    const empty = this.xMin > this.xMax || this.yMin > this.yMax;

    this.columns = empty ? new Float64Array(0) : this.cutColumns(model, r);
    const cols = this.columns.length;
    this.colStart = new Int32Array(cols + 1);
    const lo = new NumberList(cols * 3);
    const hi = new NumberList(cols * 3);

    const { ox0, ox1, oy0, oy1 } = model;
    const n = ox0.length;
    const active = new Int32Array(n);
    let activeCount = 0;
    let next = 0;
    const bLo = new Float64Array(n);
    const bHi = new Float64Array(n);
    const r2 = r * r;
    const yMin = this.yMin, yMax = this.yMax;
    const budget = model.budget;
    this.budget = budget;
    budget?.spend(cols);
    for (let c = 0; c < cols; c++) {
      const x = this.columns[c];
      budget?.spend(activeCount);
      // Keep the active list ordered by y0, so the blocked intervals below come out nearly sorted.
      while (next < n && ox0[next] - r < x) {
        const y0 = oy0[next];
        let p = activeCount++;
        while (p > 0 && oy0[active[p - 1]] > y0) {
          active[p] = active[p - 1];
          p--;
        }
        active[p] = next++;
      }
      let blocked = 0;
      let keep = 0;
      for (let k = 0; k < activeCount; k++) {
        const a = active[k];
        if (ox1[a] + r <= x) continue; // passed for good
        active[keep++] = a;
        let h: number;
        if (r === 0) {
          // A point: only the open inside of a footprint is forbidden.
          if (x <= ox0[a] || x >= ox1[a] || oy1[a] <= oy0[a]) continue;
          h = 0;
        } else {
          const dx = x < ox0[a] ? ox0[a] - x : x > ox1[a] ? x - ox1[a] : 0;
          if (dx >= r) continue;
          h = dx === 0 ? r : Math.sqrt(r2 - dx * dx);
        }
        // insertion by lower end keeps the list sorted
        const l = oy0[a] - h, u = oy1[a] + h;
        let p = blocked++;
        let shifts = 0;
        while (p > 0 && bLo[p - 1] > l) {
          shifts++;
          bLo[p] = bLo[p - 1];
          bHi[p] = bHi[p - 1];
          p--;
        }
        bLo[p] = l;
        bHi[p] = u;
        if (shifts > 8) budget?.spend(shifts);
      }
      activeCount = keep;

      this.colStart[c] = lo.length;
      // Free = [yMin, yMax] minus the union of the open blocked intervals.
      let cur = yMin;
      let done = false;
      for (let k = 0; k < blocked && !done; k++) {
        if (bLo[k] >= cur) {
          const end = bLo[k] < yMax ? bLo[k] : yMax;
          if (cur <= end) {
            lo.push(cur);
            hi.push(end);
          }
          if (bLo[k] > yMax) done = true;
        }
        if (bHi[k] > cur) cur = bHi[k];
      }
      if (!done && cur <= yMax) {
        lo.push(cur);
        hi.push(yMax);
      }
    }
    this.colStart[cols] = lo.length;
    this.lo = lo.data.subarray(0, lo.length);
    this.hi = hi.data.subarray(0, hi.length);

    // Join overlapping intervals of neighbouring columns; keep the joins as graph edges.
    const sets = new DisjointSet(this.lo.length);
    const edgeA = new NumberList(this.lo.length * 2);
    const edgeB = new NumberList(this.lo.length * 2);
    for (let c = 0; c + 1 < cols; c++) {
      let i = this.colStart[c];
      const iEnd = this.colStart[c + 1];
      let j = iEnd;
      const jEnd = this.colStart[c + 2];
      while (i < iEnd && j < jEnd) {
        if (Math.max(this.lo[i], this.lo[j]) <= Math.min(this.hi[i], this.hi[j])) {
          sets.union(i, j);
          edgeA.push(i);
          edgeB.push(j);
        }
        if (this.hi[i] < this.hi[j]) i++;
        else j++;
      }
    }
    this.edgeA = Int32Array.from(edgeA.data.subarray(0, edgeA.length));
    this.edgeB = Int32Array.from(edgeB.data.subarray(0, edgeB.length));
    this.component = new Int32Array(this.lo.length);
    for (let i = 0; i < this.lo.length; i++) this.component[i] = sets.find(i);

    // Openings: mark the components the disk can start in.
    if (model.openings.length > 32) throw new RangeError('free floor: at most 32 openings');
    const rootMask = new Uint32Array(this.lo.length);
    this.entryWidth = new Float64Array(this.lo.length);
    this.openingUsable = model.openings.map((o, k) => this.enter(o, k, rootMask));
    this.entered = new Uint32Array(this.lo.length);
    if (this.openingUsable.some(Boolean)) for (let i = 0; i < this.lo.length; i++) this.entered[i] = rootMask[this.component[i]];
  }

  /** Column positions: a merge of sorted streams (no sort per radius), clipped and de-duplicated. */
  private cutColumns(model: FreeFloorModel, r: number): Float64Array {
    const { ox0, sortedX1, baseCuts, fillStep } = model;
    const n = ox0.length;
    const extra: number[] = [this.xMin, this.xMax];
    for (const o of model.openings) if (o.edge === 'minY' || o.edge === 'maxY') extra.push(o.from + r, o.to - r);
    extra.sort((a, b) => a - b);
    const fillCount = Math.floor((this.xMax - this.xMin) / fillStep) + 1;
    const out = new Float64Array(baseCuts.length + 2 * n + extra.length + fillCount);
    // Streams: base cuts, x0 − r, x1 + r, extra, fill — each ascending.
    let ib = 0, i0 = 0, i1 = 0, ie = 0, f = 0, m = 0;
    const total = out.length;
    for (let k = 0; k < total; k++) {
      let v = Infinity, which = -1;
      if (ib < baseCuts.length && baseCuts[ib] < v) { v = baseCuts[ib]; which = 0; }
      if (i0 < n && ox0[i0] - r < v) { v = ox0[i0] - r; which = 1; }
      if (i1 < n && sortedX1[i1] + r < v) { v = sortedX1[i1] + r; which = 2; }
      if (ie < extra.length && extra[ie] < v) { v = extra[ie]; which = 3; }
      if (f < fillCount && this.xMin + f * fillStep < v) { v = this.xMin + f * fillStep; which = 4; }
      if (which === 0) ib++;
      else if (which === 1) i0++;
      else if (which === 2) i1++;
      else if (which === 3) ie++;
      else f++;
      if (v < this.xMin || v > this.xMax) continue;
      if (m === 0 || v !== out[m - 1]) out[m++] = v;
    }
    return out.slice(0, m);
  }

  /** First column index with x ≥ value. */
  private columnAtOrAfter(value: number): number {
    let a = 0, b = this.columns.length;
    while (a < b) {
      const mid = (a + b) >> 1;
      if (this.columns[mid] < value) a = mid + 1;
      else b = mid;
    }
    return a;
  }

  private enter(o: Opening, bit: number, rootMask: Uint32Array): boolean {
    const r = this.radius;
    const cols = this.columns.length;
    if (cols === 0) return false;
    const flag = 1 << bit;
    let found = false;
    if (o.edge === 'minY' || o.edge === 'maxY') {
      const from = Math.max(o.from + r, this.xMin);
      const to = Math.min(o.to - r, this.xMax);
      for (let c = this.columnAtOrAfter(from); c < cols && this.columns[c] <= to; c++) {
        for (let i = this.colStart[c]; i < this.colStart[c + 1]; i++) {
          if (o.edge === 'maxY' ? this.hi[i] >= this.yMax : this.lo[i] <= this.yMin) {
            rootMask[this.component[i]] |= flag;
            if (o.to - o.from > this.entryWidth[i]) this.entryWidth[i] = o.to - o.from;
            found = true;
          }
        }
      }
    } else {
      const c = o.edge === 'minX' ? 0 : cols - 1;
      const from = Math.max(o.from + r, this.yMin);
      const to = Math.min(o.to - r, this.yMax);
      if (from <= to) {
        for (let i = this.colStart[c]; i < this.colStart[c + 1]; i++) {
          if (this.lo[i] <= to && this.hi[i] >= from) {
            rootMask[this.component[i]] |= flag;
            if (o.to - o.from > this.entryWidth[i]) this.entryWidth[i] = o.to - o.from;
            found = true;
          }
        }
      }
    }
    return found;
  }

  /** True when the disk got in through at least one opening. */
  get anyEntry(): boolean {
    return this.openingUsable.some(Boolean);
  }

  /**
   * Which openings lead to a place where the disk centre can stand inside the closed rectangle
   * `zone`: bit k for opening k. With `anyFloor`, bit 31 is also set when any free place exists
   * there, reached or not.
   */
  openingsReachingZone(zone: Rect, anyFloor = false): number {
    let mask = 0;
    for (let c = this.columnAtOrAfter(zone.x0); c < this.columns.length && this.columns[c] <= zone.x1; c++) {
      this.budget?.spend(1 + this.colStart[c + 1] - this.colStart[c]);
      for (let i = this.colStart[c]; i < this.colStart[c + 1]; i++) {
        if (this.lo[i] <= zone.y1 && this.hi[i] >= zone.y0) mask |= this.entered[i] | (anyFloor ? 1 << 31 : 0);
      }
    }
    return mask;
  }

  /**
   * An upper bound on the diameter of a disk that can stand with its centre in `zone` having come
   * in through an opening: the widest free span across y there (interval length + 2r); -Infinity
   * when this disk cannot. Sound because a centre free for a larger disk of radius ρ is free for
   * this one with ρ − r to spare on both sides along y.
   */
  widestSpanInZone(zone: Rect): number {
    let best = -Infinity;
    for (let c = this.columnAtOrAfter(zone.x0); c < this.columns.length && this.columns[c] <= zone.x1; c++) {
      this.budget?.spend(1 + this.colStart[c + 1] - this.colStart[c]);
      for (let i = this.colStart[c]; i < this.colStart[c + 1]; i++) {
        if (this.entered[i] && this.lo[i] <= zone.y1 && this.hi[i] >= zone.y0) {
          const span = this.hi[i] - this.lo[i] + 2 * this.radius;
          if (span > best) best = span;
        }
      }
    }
    return best;
  }

  /** True when the disk, come in through an opening, can stand with its centre in `zone`. */
  reachesZone(zone: Rect): boolean {
    return this.openingsReachingZone(zone) !== 0;
  }

  /**
   * Which openings lead to a disk centre within `distance` of `rect` — closer than that when
   * `strict`, at most that far otherwise (bit k for opening k; bit 31 with `anyFloor` for any free
   * centre, reached or not). With distance = r: strict means "the person's disk passes over part of
   * this footprint", non-strict "the person can step up to it".
   */
  openingsNear(rect: Rect, distance: number, strict: boolean, anyFloor = false): number {
    let mask = 0;
    const d2 = distance * distance;
    for (let c = this.columnAtOrAfter(rect.x0 - distance); c < this.columns.length && this.columns[c] <= rect.x1 + distance; c++) {
      const x = this.columns[c];
      this.budget?.spend(1 + this.colStart[c + 1] - this.colStart[c]);
      const dx = x < rect.x0 ? rect.x0 - x : x > rect.x1 ? x - rect.x1 : 0;
      if (strict ? dx >= distance : dx > distance) continue;
      const h = dx === 0 ? distance : Math.sqrt(d2 - dx * dx);
      const a = rect.y0 - h, b = rect.y1 + h;
      for (let i = this.colStart[c]; i < this.colStart[c + 1]; i++) {
        if (strict ? this.lo[i] < b && this.hi[i] > a : this.lo[i] <= b && this.hi[i] >= a) mask |= this.entered[i] | (anyFloor ? 1 << 31 : 0);
      }
    }
    return mask;
  }
}
