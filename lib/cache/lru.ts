/**
 * A small least-recently-used cache with a budget: each entry weighs something (1 by default,
 * or e.g. its length in characters) and the oldest entries go once the total is over budget.
 * A Map keeps insertion order, so "most recently used" is simply "last inserted".
 */
export class Lru<K, V> {
  private readonly entries = new Map<K, { value: V; weight: number }>();
  private total = 0;

  constructor(
    private readonly budget: number,
    private readonly weigh: (value: V) => number = () => 1,
  ) {}

  get(key: K): V | undefined {
    const entry = this.entries.get(key);
    if (!entry) return undefined;
    this.entries.delete(key);
    this.entries.set(key, entry);
    return entry.value;
  }

  set(key: K, value: V): void {
    this.delete(key);
    const weight = this.weigh(value);
    if (weight > this.budget) return; // would evict everything and still not fit
    this.entries.set(key, { value, weight });
    this.total += weight;
    while (this.total > this.budget) this.delete(this.entries.keys().next().value as K);
  }

  delete(key: K): void {
    const entry = this.entries.get(key);
    if (!entry) return;
    this.entries.delete(key);
    this.total -= entry.weight;
  }

  clear(): void {
    this.entries.clear();
    this.total = 0;
  }

  get size(): number {
    return this.entries.size;
  }

  /** The summed weight of what is held. */
  get weight(): number {
    return this.total;
  }
}
