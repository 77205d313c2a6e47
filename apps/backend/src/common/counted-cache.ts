import type { Counters, CountedTable, Generation } from './change-counters';

/**
 * Results of expensive reads, keyed by the database's change counters of the tables they
 * are read from (common/change-counters.ts). A request reads the counters once
 * (`ChangeCounters.read()`) and passes them in: while they are what the kept results were
 * computed under, those results are served; once any of the tables was written, by any
 * code path on any server, the counters are higher, the kept results are dropped and the
 * answer is computed again. Nothing expires by time and no code announces a write.
 *
 * A computation starts after its counters were read, so its result is at least as new as
 * they say. Concurrent misses of one key under the same counters share one computation; a
 * request that read older counters than the cache holds computes alone and keeps nothing.
 */
export class CountedCache<T> {
  private generation: Generation = -1;
  private readonly entries = new Map<string, T>();
  private readonly pending = new Map<string, Promise<T>>();

  /**
   * @param tables every table the computation reads: a test (test/caches.e2e-spec.ts)
   *   checks the list against the SQL the computation runs.
   */
  constructor(
    readonly tables: readonly CountedTable[],
    private readonly maxEntries: number,
  ) {}

  async get(counters: Counters, key: string, compute: () => Promise<T>): Promise<T> {
    const generation = counters.of(this.tables);
    if (generation > this.generation) {
      this.generation = generation;
      this.entries.clear();
    }
    if (generation === this.generation) {
      const hit = this.entries.get(key);
      if (hit !== undefined) return hit;
    }
    const pendingKey = `${generation}|${key}`;
    const running = this.pending.get(pendingKey);
    if (running) return running;
    const computation: Promise<T> = compute().finally(() => {
      if (this.pending.get(pendingKey) === computation) this.pending.delete(pendingKey);
    });
    this.pending.set(pendingKey, computation);
    const value = await computation;
    if (generation === this.generation) {
      if (this.entries.size >= this.maxEntries) {
        this.entries.delete(this.entries.keys().next().value as string);
      }
      this.entries.set(key, value);
    }
    return value;
  }
}
