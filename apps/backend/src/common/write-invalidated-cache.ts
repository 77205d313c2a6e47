import type { EntityManager, EntityName, EventSubscriber, FlushEventArgs } from '@mikro-orm/core';
import { onSqlWrite } from './sql-writes';

interface Entry<T> {
  value: T;
  generation: number;
  at: number;
}

/**
 * Results of expensive reads, kept until the next write that could change them. Any flush
 * through MikroORM that creates, changes or deletes one of the watched entities bumps the
 * generation and empties the cache, and so does a plain-SQL write announced through
 * `announceSqlWrite`.
 * A result computed while a write was flushed is stored under the old generation, so it is
 * never served; and no result is older than `maxAgeMs`, for writes made outside this
 * process.
 */
export class WriteInvalidatedCache<T> implements EventSubscriber {
  private generation = 0;
  private readonly entries = new Map<string, Entry<T>>();
  private readonly names: ReadonlySet<string>;
  private unwatchSql: (() => void) | null = null;

  constructor(
    watched: readonly EntityName<object>[],
    private readonly maxAgeMs: number,
    private readonly maxEntries: number,
  ) {
    this.names = new Set(
      watched.map((e) => (typeof e === 'string' ? e : (e as { name: string }).name)),
    );
  }

  /** Starts watching the flushes of `em` and the SQL writes (once, when the module starts). */
  watch(em: EntityManager): void {
    em.getEventManager().registerSubscriber(this);
    this.unwatchSql = onSqlWrite((names) => {
      if (names.some((n) => this.names.has(n))) this.invalidate();
    });
  }

  /** Stops listening to SQL writes (when the module stops). */
  unwatch(): void {
    this.unwatchSql?.();
    this.unwatchSql = null;
  }

  afterFlush(args: FlushEventArgs): void {
    if (args.uow.getChangeSets().some((cs) => this.names.has(cs.name))) this.invalidate();
  }

  invalidate(): void {
    this.generation++;
    this.entries.clear();
  }

  async get(key: string, compute: () => Promise<T>): Promise<T> {
    const hit = this.entries.get(key);
    if (hit && hit.generation === this.generation && Date.now() - hit.at < this.maxAgeMs) {
      return hit.value;
    }
    const generation = this.generation;
    const value = await compute();
    if (generation === this.generation) {
      if (this.entries.size >= this.maxEntries) {
        this.entries.delete(this.entries.keys().next().value as string);
      }
      this.entries.set(key, { value, generation, at: Date.now() });
    }
    return value;
  }
}
