/**
 * A small least-recently-used map for in-process caches: bounded by entry count and, optionally,
 * by a total weight (e.g. the length of cached JSON strings). One process, no expiry by time:
 * keys carry whatever version stamp makes an old entry unreachable.
 */
export interface LruOptions<V> {
  maxEntries: number;
  /** Upper bound on the summed weight of all entries (default: no bound). */
  maxWeight?: number;
  /** Weight of one value (default 1). */
  weigh?: (value: V) => number;
}

export class Lru<K, V> {
  private readonly entries = new Map<K, { value: V; weight: number }>();
  private total = 0;

  constructor(private readonly opts: LruOptions<V>) {}

  get size(): number {
    return this.entries.size;
  }

  get weight(): number {
    return this.total;
  }

  /** The value, marked as most recently used; undefined when absent. */
  get(key: K): V | undefined {
    const hit = this.entries.get(key);
    if (!hit) return undefined;
    this.entries.delete(key);
    this.entries.set(key, hit);
    return hit.value;
  }

  /** Stores the value as most recently used and evicts the oldest entries beyond the bounds. */
  set(key: K, value: V): void {
    const weight = this.opts.weigh ? this.opts.weigh(value) : 1;
    const old = this.entries.get(key);
    if (old) {
      this.total -= old.weight;
      this.entries.delete(key);
    }
    const maxWeight = this.opts.maxWeight ?? Infinity;
    if (weight > maxWeight) return; // would evict everything else and still not fit
    this.entries.set(key, { value, weight });
    this.total += weight;
    for (const [k, e] of this.entries) {
      if (this.entries.size <= this.opts.maxEntries && this.total <= maxWeight) break;
      this.entries.delete(k);
      this.total -= e.weight;
    }
  }

  clear(): void {
    this.entries.clear();
    this.total = 0;
  }
}
