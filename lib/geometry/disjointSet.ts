/**
 * A disjoint-set forest (union–find with path halving and union by size) over the integers
 * 0..n-1: the connectivity bookkeeping behind free-floor components and bed grouping. Written
 * here because it is a dozen lines on a typed array; the npm packages for it add nothing.
 *
 * Must never import anything of ours: plain numbers in, plain numbers out.
 */
export class DisjointSet {
  private readonly parent: Int32Array;
  private readonly size: Int32Array;

  constructor(n: number) {
    if (!Number.isInteger(n) || n < 0) throw new RangeError(`DisjointSet needs a whole number of items, got ${n}`);
    this.parent = new Int32Array(n);
    this.size = new Int32Array(n).fill(1);
    for (let i = 0; i < n; i++) this.parent[i] = i;
  }

  get length(): number {
    return this.parent.length;
  }

  find(i: number): number {
    const p = this.parent;
    while (p[i] !== i) {
      p[i] = p[p[i]];
      i = p[i];
    }
    return i;
  }

  /** Joins the sets of a and b; returns the new root. */
  union(a: number, b: number): number {
    let ra = this.find(a);
    let rb = this.find(b);
    if (ra === rb) return ra;
    if (this.size[ra] < this.size[rb]) [ra, rb] = [rb, ra];
    this.parent[rb] = ra;
    this.size[ra] += this.size[rb];
    return ra;
  }

  same(a: number, b: number): boolean {
    return this.find(a) === this.find(b);
  }
}
