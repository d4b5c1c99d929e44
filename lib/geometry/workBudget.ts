/**
 * A work budget: a count of elementary steps (a candidate pair compared, an interval visited, a
 * grid cell filled) that one computation may spend. Geometry that can go super-linear on hostile
 * input — a thousand footprints on one spot, a sweep where every obstacle spans every column —
 * charges it and stops with a `WorkLimitError` instead of running for minutes. Callers size it
 * from the input (n log n) so ordinary layouts never come near it.
 *
 * Must never import anything of ours: plain numbers in, plain numbers out.
 */
export class WorkLimitError extends RangeError {
  constructor(readonly limit: number) {
    super(`it is too complex to check within the work allowed for its size (${limit.toLocaleString('en-GB')} steps)`);
    this.name = 'WorkLimitError';
  }
}

export class WorkBudget {
  private spent = 0;

  constructor(readonly limit: number) {
    if (!(limit >= 0)) throw new RangeError(`a work budget must be ≥ 0, got ${limit}`);
  }

  /** Steps for an input of n items: `base + perItem · n · log2(n + 2)`. */
  static forItems(n: number, perItem: number, base: number): WorkBudget {
    return new WorkBudget(Math.round(base + perItem * n * Math.log2(n + 2)));
  }

  /** No limit (tests and callers that bound their input another way). */
  static unlimited(): WorkBudget {
    return new WorkBudget(Number.POSITIVE_INFINITY);
  }

  get used(): number {
    return this.spent;
  }

  get left(): number {
    return this.limit - this.spent;
  }

  /** Charges `steps`; throws WorkLimitError once the total passes the limit. */
  spend(steps: number): void {
    this.spent += steps;
    if (this.spent > this.limit) throw new WorkLimitError(this.limit);
  }
}
